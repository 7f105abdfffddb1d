import { Button, Callout, FormGroup, HTMLSelect, HTMLTable, Intent, Spinner, Tag } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import type { ChangeEvent } from 'react';
import type { TieSuggestionsState } from '@/modules/correlation/hooks/useTieSuggestions';
import { suggestionKey } from '@/modules/correlation/utils/ladderOverlays';

export type TieSuggestionsPanelProps = {
  /** The cores on the ladder, along strike. */
  cores: readonly { id: string; name: string }[];
  state: TieSuggestionsState;
  /** "E3 at Core A" by event id. */
  eventLabels: ReadonlyMap<string, string>;
};

/**
 * Proposed ties between two chosen cores, from their logs' shared channels and the order of their
 * beds (dynamic time warping of each bed's log signature, pairs kept in order down both cores):
 * each with its score, drawn dotted on the ladder; the correlator accepts one as a tie with the
 * evidence "log match". Nothing is tied until then.
 */
export function TieSuggestionsPanel({ cores, state, eventLabels }: TieSuggestionsPanelProps) {
  const { siteAId, siteBId, setCores, ready, suggestions, loading, error, accept, acceptingKey } = state;
  const handleA = (event: ChangeEvent<HTMLSelectElement>) => setCores([event.target.value || null, siteBId]);
  const handleB = (event: ChangeEvent<HTMLSelectElement>) => setCores([siteAId, event.target.value || null]);
  if (cores.length < 2) return <p>Proposals need two cores on the ladder, each with a log.</p>;
  const options = [{ value: '', label: 'Choose a core' }, ...cores.map((core) => ({ value: core.id, label: core.name }))];
  const label = (id: string, fallback: string) => eventLabels.get(id) ?? fallback;
  return (
    <div className="sc-side-list sc-tie-suggestions">
      <div className="sc-tie-suggestions-pick">
        <FormGroup label="First core" labelFor="suggest-core-a">
          <HTMLSelect id="suggest-core-a" fill value={siteAId ?? ''} options={options} onChange={handleA} />
        </FormGroup>
        <FormGroup label="Second core" labelFor="suggest-core-b">
          <HTMLSelect id="suggest-core-b" fill value={siteBId ?? ''} options={options} onChange={handleB} />
        </FormGroup>
      </div>
      {siteAId !== null && siteAId === siteBId && <p>Choose two different cores.</p>}
      {!ready && siteAId !== siteBId && <p className="sc-chart-legend">Choose two cores with logs sharing a channel to see proposed ties between their turbidites.</p>}
      {loading && <Spinner size={20} />}
      {error && (
        <Callout intent={Intent.DANGER} icon={IconNames.ERROR} className="sc-form-callout">
          {error.message}
        </Callout>
      )}
      {ready && !loading && !error && suggestions.length === 0 && <p>No bed pair of these cores matches well enough (score 0.5 or more).</p>}
      {suggestions.length > 0 && (
        <>
          <HTMLTable compact className="sc-table">
            <thead>
              <tr>
                <th>Proposed tie</th>
                <th>Score</th>
                <th />
              </tr>
            </thead>
            <tbody>
              {suggestions.map((suggestion) => {
                const key = suggestionKey(suggestion);
                const handleAccept = () => accept(suggestion);
                return (
                  <tr key={key}>
                    <td>
                      {label(suggestion.eventA.id, suggestion.eventA.name)} – {label(suggestion.eventB.id, suggestion.eventB.name)}
                    </td>
                    <td className="num">{suggestion.score.toFixed(2)}</td>
                    <td>
                      {suggestion.tied ? (
                        <Tag minimal icon={IconNames.LINK}>
                          tied
                        </Tag>
                      ) : (
                        <Button
                          size="small"
                          icon={IconNames.TICK}
                          text="Accept"
                          aria-label={`Accept the tie ${label(suggestion.eventA.id, suggestion.eventA.name)} – ${label(suggestion.eventB.id, suggestion.eventB.name)}`}
                          loading={acceptingKey === key}
                          disabled={acceptingKey !== null && acceptingKey !== key}
                          onClick={handleAccept}
                        />
                      )}
                    </td>
                  </tr>
                );
              })}
            </tbody>
          </HTMLTable>
          <p className="sc-chart-legend">
            Compared on {suggestions[0]?.channels.join(', ')}. Scores run 0–1 (similar log signatures score high); proposals are drawn dotted on the
            ladder with their score. Accepting ties the pair with the evidence “log match” at confidence 3 (likely).
          </p>
        </>
      )}
    </div>
  );
}
