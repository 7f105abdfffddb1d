import { queryOptions } from '@tanstack/react-query';
import { feature } from 'topojson-client';
import type { GeometryCollection, Topology } from 'topojson-specification';

/**
 * The world's land outline, shipped with the app (world-atlas, Natural Earth 1:50m) and loaded
 * as its own chunk the first time a map is shown; nothing comes from a tile server.
 */
export const mapQueries = {
  land: () =>
    queryOptions({
      queryKey: ['map', 'land-50m'] as const,
      queryFn: async () => {
        const module = (await import('world-atlas/land-50m.json')) as { default: unknown };
        const topology = module.default as Topology<{ land: GeometryCollection }>;
        return feature(topology, topology.objects.land);
      },
      staleTime: Infinity,
      gcTime: Infinity,
    }),
};
