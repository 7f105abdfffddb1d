import { useQueries } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { graphqlRequest } from '@/modules/api/utils/graphqlClient';
import { LadderCoreLogsDocument } from '@/modules/correlation/graphql/ladderCoreLogs';
import { ladderQueries } from '@/modules/correlation/hooks/ladderQueries';
import { logChannels, type LadderCoreLike } from '@/modules/correlation/utils/ladderCoreLogs';

/**
 * The ladder's optional core-log lane: off by default; once on, each core's units, horizons and
 * logs are read (one request per core) and one channel is chosen across them, the first offered
 * unless the reader picks another. A core whose logs lack the channel draws nothing.
 */
export function useLadderCoreLogs(projectId: string, cores: readonly { id: string }[]) {
  const [shown, setShown] = useState(false);
  const [chosenChannel, setChannel] = useState<string | null>(null);
  const results = useQueries({
    queries: cores.map((core) => ({
      queryKey: [...ladderQueries.all(projectId), 'core-logs', core.id] as const,
      queryFn: async () => (await graphqlRequest(LadderCoreLogsDocument, { id: core.id })).site,
      enabled: shown,
    })),
  });
  const sites = results.map((result) => result.data).filter((site) => site !== undefined);
  const channels = logChannels(sites.flatMap((site) => site.coreLogs));
  const channel = chosenChannel !== null && channels.includes(chosenChannel) ? chosenChannel : (channels[0] ?? null);
  const dataKey = results.map((result) => result.dataUpdatedAt).join(',');
  const coreLogs = useMemo<LadderCoreLike[]>(
    () =>
      sites.map((site) => {
        const trace = site.coreLogs.flatMap((log) => log.traces).find((entry) => entry.channel === channel) ?? null;
        return {
          siteId: site.id,
          units: site.units,
          horizons: site.eventHorizons.map((horizon) => ({ id: horizon.id, unitAboveId: horizon.unitAbove.id })),
          trace,
        };
      }),
    // The sites change only when a query's data does (dataKey).
    [dataKey, channel],
  );
  const unit = sites.flatMap((site) => site.coreLogs.flatMap((log) => log.traces)).find((entry) => entry.channel === channel)?.unit ?? null;
  return {
    shown,
    setShown,
    channels,
    channel,
    setChannel,
    unit,
    coreLogs: shown ? coreLogs : [],
    loading: shown && results.some((result) => result.isPending),
    error: results.find((result) => result.error)?.error ?? null,
    withoutLog: sites.filter((site) => site.coreLogs.length === 0).length,
  };
}

export type LadderCoreLogsState = ReturnType<typeof useLadderCoreLogs>;
