import { Button, Callout, H2, HTMLSelect, Intent, NonIdealState, SegmentedControl, Switch, Tab, Tabs, Tag } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useQuery } from '@tanstack/react-query';
import { useMemo, useRef, useState, type ChangeEvent } from 'react';
import { useAgeScale } from '@/modules/ages/hooks/useAgeScale';
import { ageScaleLabel } from '@/modules/ages/utils/formatAge';
import { useGraphqlMutation } from '@/modules/api/hooks/useGraphqlMutation';
import { allows } from '@/modules/auth/utils/permissions';
import { CoreLogsCaption, CoreLogsToggle } from '@/modules/correlation/components/CoreLogsControls';
import { CoreLogsOverlay } from '@/modules/correlation/components/CoreLogsOverlay';
import { EventLadderChart, type LadderColumn } from '@/modules/correlation/components/EventLadderChart';
import { FigureExportButtons } from '@/modules/correlation/components/FigureExportButtons';
import { HypothesisDialog, type HypothesisValues } from '@/modules/correlation/components/HypothesisDialog';
import { JointRunPanel } from '@/modules/correlation/components/JointRunPanel';
import { OrderLoopsCallout } from '@/modules/correlation/components/OrderLoopsCallout';
import { OrderLoopsOverlay } from '@/modules/correlation/components/OrderLoopsOverlay';
import { RegionalEventsPanel } from '@/modules/correlation/components/RegionalEventsPanel';
import { SpaceTimeChart } from '@/modules/correlation/components/SpaceTimeChart';
import { SizeProfileChart } from '@/modules/correlation/components/SizeProfileChart';
import { TieDialog, type TieValues } from '@/modules/correlation/components/TieDialog';
import { TiesList } from '@/modules/correlation/components/TiesList';
import { TieSuggestionsOverlay } from '@/modules/correlation/components/TieSuggestionsOverlay';
import { TieSuggestionsPanel } from '@/modules/correlation/components/TieSuggestionsPanel';
import { useTieSuggestions } from '@/modules/correlation/hooks/useTieSuggestions';
import { useLadderCoreLogs } from '@/modules/correlation/hooks/useLadderCoreLogs';
import { bedPixelsPerMetre } from '@/modules/correlation/utils/ladderCoreLogs';
import { AddTieDocument, CreateHypothesisDocument, RemoveTieDocument, SetPreferredHypothesisDocument } from '@/modules/correlation/graphql/ladder';
import { ladderQueries } from '@/modules/correlation/hooks/ladderQueries';
import { conflictingTieIds, eventAnchors, tieDifferences } from '@/modules/correlation/utils/ladderData';
import { canTieEvents, nextEventSelection, orderAlongStrike } from '@/modules/correlation/utils/ladderLayout';
import { LoadingState } from '@/modules/ui/components/LoadingState';
import '@/modules/correlation/components/charts.css';

type ViewMode = 'ladder' | 'space-time';

const VIEW_OPTIONS = [
  { value: 'ladder', label: 'Ladder' },
  { value: 'space-time', label: 'Space–time' },
];

export type LadderViewProps = { projectId: string };

/**
 * The event ladder of a project: sites along strike, events down in time, one or two
 * hypotheses' ties and regional events over them, and for correlators the editing of ties and
 * hypotheses.
 */
export function LadderView({ projectId }: LadderViewProps) {
  const ladderQuery = useQuery(ladderQueries.ladder(projectId));
  const [chosenHypothesisId, setChosenHypothesisId] = useState<string | null>(null);
  const [compareHypothesisId, setCompareHypothesisId] = useState<string | null>(null);
  const [comparing, setComparing] = useState(false);
  const [mode, setMode] = useState<ViewMode>('ladder');
  const [selection, setSelection] = useState<string[]>([]);
  const [tieOpen, setTieOpen] = useState(false);
  const [hypothesisOpen, setHypothesisOpen] = useState(false);
  const [removingTieId, setRemovingTieId] = useState<string | null>(null);
  const [selectedLoopKey, setSelectedLoopKey] = useState<string | null>(null);
  const primaryFigure = useRef<SVGSVGElement | null>(null);
  const secondFigure = useRef<SVGSVGElement | null>(null);
  const { scale } = useAgeScale();

  const hypotheses = ladderQuery.data?.project.hypotheses ?? [];
  const defaultHypothesis = hypotheses.find((hypothesis) => hypothesis.preferred) ?? hypotheses[0];
  const hypothesisId = chosenHypothesisId && hypotheses.some((entry) => entry.id === chosenHypothesisId) ? chosenHypothesisId : (defaultHypothesis?.id ?? null);
  const secondId = comparing ? (compareHypothesisId ?? hypotheses.find((entry) => entry.id !== hypothesisId)?.id ?? null) : null;

  const hypothesisQuery = useQuery({ ...ladderQueries.hypothesis(projectId, hypothesisId ?? ''), enabled: hypothesisId !== null });
  const suggestions = useTieSuggestions(projectId, hypothesisId);
  const secondQuery = useQuery({ ...ladderQueries.hypothesis(projectId, secondId ?? ''), enabled: secondId !== null });

  const invalidates = [ladderQueries.all(projectId)];
  const addTie = useGraphqlMutation(AddTieDocument, { invalidates });
  const removeTie = useGraphqlMutation(RemoveTieDocument, { invalidates });
  const createHypothesis = useGraphqlMutation(CreateHypothesisDocument, { invalidates });
  const setPreferred = useGraphqlMutation(SetPreferredHypothesisDocument, { invalidates });

  const columns = useMemo<LadderColumn[]>(() => orderAlongStrike(ladderQuery.data?.eventLadder.columns ?? []), [ladderQuery.data]);
  const anchors = useMemo(() => eventAnchors(columns), [columns]);
  const coreSites = useMemo(() => columns.filter((column) => column.site.kind === 'CORE').map((column) => column.site), [columns]);
  const coreLogs = useLadderCoreLogs(projectId, coreSites);
  const logPixelsPerMetre = useMemo(() => bedPixelsPerMetre(coreLogs.coreLogs), [coreLogs.coreLogs]);
  const eventNames = useMemo(() => {
    const names = new Map<string, string>();
    for (const column of columns) for (const event of column.events) names.set(event.eventHorizon.id, `${event.eventHorizon.name} at ${column.site.name}`);
    return names;
  }, [columns]);

  if (ladderQuery.isPending) return <LoadingState label="Loading the ladder" />;
  if (ladderQuery.isError) return <NonIdealState icon={IconNames.ERROR} title="The ladder could not be loaded" description={ladderQuery.error.message} />;

  const { project } = ladderQuery.data;
  const canEdit = allows(project, 'CORRELATION_WRITE');
  const hypothesis = hypothesisQuery.data ?? null;
  const second = secondQuery.data ?? null;
  const [first, next] = selection.map((id) => anchors.get(id));
  const tieable = canEdit && hypothesis !== null && canTieEvents(first, next);
  const unmodelled = columns.filter((column) => !column.latestAgeModelRun).length;
  const stale = columns.filter((column) => column.latestAgeModelRun?.stale).length;

  const handleSelectEvent = (eventId: string) => setSelection((previous) => nextEventSelection(previous, eventId));
  const handleHypothesisChange = (event: ChangeEvent<HTMLSelectElement>) => setChosenHypothesisId(event.target.value);
  const handleCompareChange = (event: ChangeEvent<HTMLSelectElement>) => setCompareHypothesisId(event.target.value);
  const handleComparingChange = () => setComparing((previous) => !previous);
  const handleModeChange = (value: string) => setMode(value as ViewMode);
  const handleOpenTie = () => setTieOpen(true);
  const handleCloseTie = () => setTieOpen(false);
  const handleTie = ({ confidence, evidence, note }: TieValues) => {
    if (!hypothesis || !first || !next) return;
    addTie.mutate(
      { input: { hypothesisId: hypothesis.id, eventAId: first.eventId, eventBId: next.eventId, confidence, evidence, note } },
      {
        onSuccess: () => {
          setTieOpen(false);
          setSelection([]);
        },
      },
    );
  };
  const handleRemoveTie = (tieId: string) => {
    setRemovingTieId(tieId);
    removeTie.mutate({ id: tieId }, { onSettled: () => setRemovingTieId(null) });
  };
  const handleOpenHypothesis = () => setHypothesisOpen(true);
  const handleCloseHypothesis = () => setHypothesisOpen(false);
  const handleCreateHypothesis = ({ name, description, copyCurrent }: HypothesisValues) => {
    createHypothesis.mutate(
      { input: { projectId, name, description, copyFromId: copyCurrent && hypothesis ? hypothesis.id : null } },
      {
        onSuccess: ({ createHypothesis: created }) => {
          setHypothesisOpen(false);
          setChosenHypothesisId(created.id);
        },
      },
    );
  };
  const handleSetPreferred = () => {
    if (hypothesis) setPreferred.mutate({ id: hypothesis.id });
  };
  const handleClearSelection = () => setSelection([]);

  const figureTitle = (name: string | undefined) => `${mode === 'ladder' ? 'Event ladder' : 'Regional events in space and time'} · ${project.name}${name ? ` · ${name}` : ''}`;
  const figureCaption =
    mode === 'ladder'
      ? `Sites in along-strike order, calendar time down (${ageScaleLabel(scale)}). Each shape is a site event's modelled age density, scaled to its own peak, with its median; lines are ties of the hypothesis; bands are regional events (R1 youngest) over their combined 95.4 % range; a hatched band marked ✕ fails a check (concordance, same age or order).`
      : `Distance along strike (km) across, calendar time down (${ageScaleLabel(scale)}). Each bar is a regional event (R1 youngest) over its sites' along-strike extent and combined 95.4 % range, with its combined median; dashed lines are segment boundaries; a hatched bar marked ✕ fails a check.`;
  // Side by side: the ties each hypothesis has and the other lacks, marked on its chart and listed.
  const differences = secondId && hypothesis && second ? tieDifferences(hypothesis.ties, second.ties) : null;
  const differingIn = (shown: typeof hypothesis) =>
    !differences || !shown ? undefined : new Set((shown.id === hypothesis?.id ? differences.onlyFirst : differences.onlySecond).map((tie) => tie.id));
  const tieLabel = (tie: { eventA: { id: string; name: string }; eventB: { id: string; name: string } }) =>
    `${eventNames.get(tie.eventA.id) ?? tie.eventA.name} – ${eventNames.get(tie.eventB.id) ?? tie.eventB.name}`;
  const renderFigure = (shown: typeof hypothesis, figure: typeof primaryFigure) =>
    mode === 'ladder' ? (
      <EventLadderChart
        columns={columns}
        hypothesis={shown}
        selectedEventIds={selection}
        onSelectEvent={handleSelectEvent}
        figure={figure}
        overlay={(geometry) => (
          <>
            <CoreLogsOverlay geometry={geometry} cores={coreLogs.coreLogs} pixelsPerMetre={logPixelsPerMetre} />
            <OrderLoopsOverlay geometry={geometry} loops={shown?.orderConflicts ?? []} selectedKey={shown === hypothesis ? selectedLoopKey : null} />
            {canEdit && shown === hypothesis && <TieSuggestionsOverlay geometry={geometry} suggestions={suggestions.suggestions} />}
          </>
        )}
        differingTieIds={differingIn(shown)}
      />
    ) : (
      <SpaceTimeChart columns={columns} hypothesis={shown} segments={project.segments} figure={figure} />
    );

  return (
    <div className="sc-ladder">
      <header className="sc-page-header">
        <H2 className="sc-page-title">Event ladder · {project.name}</H2>
      </header>
      <div className="sc-ladder-toolbar">
        <SegmentedControl size="small" options={VIEW_OPTIONS} value={mode} onValueChange={handleModeChange} aria-label="View" />
        {mode === 'ladder' && <CoreLogsToggle state={coreLogs} coreCount={coreSites.length} />}
        {hypotheses.length > 0 ? (
          <HTMLSelect value={hypothesisId ?? ''} onChange={handleHypothesisChange} aria-label="Hypothesis">
            {hypotheses.map((entry) => (
              <option key={entry.id} value={entry.id}>
                {entry.name}
                {entry.preferred ? ' (preferred)' : ''}
              </option>
            ))}
          </HTMLSelect>
        ) : (
          <Tag minimal>no hypothesis yet</Tag>
        )}
        {hypothesis?.preferred && (
          <Tag intent={Intent.SUCCESS} icon={IconNames.STAR} minimal>
            preferred
          </Tag>
        )}
        <Switch checked={comparing} onChange={handleComparingChange} label="Side by side" disabled={hypotheses.length < 2} inline />
        {comparing && (
          <HTMLSelect value={secondId ?? ''} onChange={handleCompareChange} aria-label="Second hypothesis">
            {hypotheses.map((entry) => (
              <option key={entry.id} value={entry.id}>
                {entry.name}
              </option>
            ))}
          </HTMLSelect>
        )}
        {canEdit && (
          <>
            <Button icon={IconNames.LINK} text="Tie" intent={Intent.PRIMARY} disabled={!tieable} onClick={handleOpenTie} title="Select two events in different columns" />
            <Button icon={IconNames.PLUS} text="New hypothesis" onClick={handleOpenHypothesis} />
            {hypothesis && !hypothesis.preferred && (
              <Button icon={IconNames.STAR_EMPTY} text="Mark preferred" onClick={handleSetPreferred} loading={setPreferred.isPending} />
            )}
          </>
        )}
        {selection.length > 0 && (
          <span>
            Selected: {selection.map((id) => eventNames.get(id) ?? id).join(' and ')}{' '}
            <Button size="small" variant="minimal" icon={IconNames.CROSS} aria-label="Clear selection" onClick={handleClearSelection} />
          </span>
        )}
      </div>
      {mode === 'ladder' && <CoreLogsCaption state={coreLogs} pixelsPerMetre={logPixelsPerMetre} />}
      {(unmodelled > 0 || stale > 0) && (
        <Callout intent={Intent.WARNING} icon={IconNames.OUTDATED} className="sc-form-callout">
          {unmodelled > 0 && `${unmodelled} site(s) have no age model yet and show no events. `}
          {stale > 0 && `${stale} site(s) changed since their last age model run: their ages are out of date.`}
        </Callout>
      )}
      {hypothesis && <OrderLoopsCallout loops={hypothesis.orderConflicts} selectedKey={selectedLoopKey} onSelect={setSelectedLoopKey} />}
      {(removeTie.error || setPreferred.error) && (
        <Callout intent={Intent.DANGER} icon={IconNames.ERROR} className="sc-form-callout">
          {(removeTie.error ?? setPreferred.error)?.message}
        </Callout>
      )}
      {differences && hypothesis && second && (
        <Callout icon={IconNames.CHANGES} className="sc-form-callout sc-ladder-differences" data-testid="ladder-differences">
          {differences.onlyFirst.length + differences.onlySecond.length === 0 ? (
            <>The two hypotheses tie the same events; their regional events are the same.</>
          ) : (
            <>
              <strong>What differs:</strong> {differences.onlyFirst.length} {differences.onlyFirst.length === 1 ? 'tie' : 'ties'} only in {hypothesis.name},{' '}
              {differences.onlySecond.length} only in {second.name}; regional events {hypothesis.regionalEvents.length} against {second.regionalEvents.length}.
              Ties marked ◇ on each chart are the ones the other lacks.
              <ul className="sc-difference-list">
                {differences.onlyFirst.slice(0, 4).map((tie) => (
                  <li key={tie.id}>
                    only in {hypothesis.name}: {tieLabel(tie)}
                  </li>
                ))}
                {differences.onlySecond.slice(0, 4).map((tie) => (
                  <li key={tie.id}>
                    only in {second.name}: {tieLabel(tie)}
                  </li>
                ))}
                {differences.onlyFirst.length + differences.onlySecond.length > 8 && <li>… and the rest in each hypothesis's Ties tab</li>}
              </ul>
            </>
          )}
        </Callout>
      )}
      {columns.length === 0 ? (
        <NonIdealState icon={IconNames.TIMELINE_EVENTS} title="No sites yet" description="Add sites and run their age models to fill the ladder." />
      ) : (
        <div className={secondId ? 'sc-ladder-layout sc-ladder-layout-pair' : 'sc-ladder-layout'}>
          <div className="sc-ladder-main">
            <div className={secondId ? 'sc-ladder-pair' : undefined}>
              <section>
                <div className="sc-figure-head">
                  <strong>{hypothesis?.name ?? 'No hypothesis'}</strong>
                  <FigureExportButtons figure={primaryFigure} title={figureTitle(hypothesis?.name)} caption={figureCaption} />
                </div>
                {renderFigure(hypothesis, primaryFigure)}
              </section>
              {secondId && (
                <section>
                  <div className="sc-figure-head">
                    <strong>{second?.name ?? '…'}</strong>
                    <FigureExportButtons figure={secondFigure} title={figureTitle(second?.name)} caption={figureCaption} />
                  </div>
                  {renderFigure(second, secondFigure)}
                </section>
              )}
            </div>
            {mode !== 'ladder' && hypothesis && <SizeProfileChart projectId={projectId} hypothesisId={hypothesis.id} columns={columns} />}
          </div>
          <aside>
            {hypothesis ? (
              <Tabs id="ladder-side" renderActiveTabPanelOnly>
                <Tab id="regional" title={`Regional events (${hypothesis.regionalEvents.length})`} panel={<RegionalEventsPanel projectId={projectId} hypothesis={hypothesis} eventLabels={eventNames} />} />
                <Tab
                  id="joint"
                  title="Joint run"
                  panel={<JointRunPanel projectId={projectId} hypothesis={hypothesis} canRun={canEdit} eventLabels={eventNames} />}
                />
                <Tab
                  id="ties"
                  title={`Ties (${hypothesis.ties.length})`}
                  panel={
                    <TiesList
                      hypothesis={hypothesis}
                      eventLabels={eventNames}
                      conflictingTieIds={conflictingTieIds(hypothesis.orderConflicts)}
                      selectedEventIds={selection}
                      canEdit={canEdit}
                      removingTieId={removingTieId}
                      onRemove={handleRemoveTie}
                    />
                  }
                />
                {canEdit && (
                  <Tab
                    id="suggestions"
                    title="Proposals"
                    panel={
                      <TieSuggestionsPanel
                        cores={coreSites}
                        state={suggestions}
                        eventLabels={eventNames}
                      />
                    }
                  />
                )}
              </Tabs>
            ) : (
              <p>Choose or create a hypothesis to see its regional events.</p>
            )}
            <p className="sc-chart-legend sc-ladder-footnote">
              Wheel to zoom the time axis, drag to pan, double-click to reset. Keyboard: Tab to an event, arrow keys to move between events,
              Enter to select it for a tie. Shapes are scaled to their own peak; bands span the combined 95.4 % range; a hatched band marked ✕
              fails a check; an order loop is drawn in a long-short dash with its label. Ages in {ageScaleLabel(scale)}.
            </p>
          </aside>
        </div>
      )}
      <TieDialog
        key={selection.join('+')}
        isOpen={tieOpen}
        description={selection.map((id) => eventNames.get(id) ?? id).join(' – ')}
        submitting={addTie.isPending}
        error={addTie.error}
        onClose={handleCloseTie}
        onSubmit={handleTie}
      />
      <HypothesisDialog
        isOpen={hypothesisOpen}
        currentName={hypothesis?.name ?? null}
        submitting={createHypothesis.isPending}
        error={createHypothesis.error}
        onClose={handleCloseHypothesis}
        onSubmit={handleCreateHypothesis}
      />
    </div>
  );
}
