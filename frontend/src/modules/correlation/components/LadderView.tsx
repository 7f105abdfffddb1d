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
import { conflictingTieIds, eventAnchors } from '@/modules/correlation/utils/ladderData';
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

  const figureTitle = (name: string | undefined) => `${mode === 'ladder' ? 'Event ladder' : 'Space-time'} ${project.name} ${name ?? ''}`;
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
      />
    ) : (
      <SpaceTimeChart columns={columns} hypothesis={shown} figure={figure} />
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
      {columns.length === 0 ? (
        <NonIdealState icon={IconNames.TIMELINE_EVENTS} title="No sites yet" description="Add sites and run their age models to fill the ladder." />
      ) : (
        <div className="sc-ladder-layout">
          <div className="sc-ladder-main">
            <div className={secondId ? 'sc-ladder-pair' : undefined}>
              <section>
                <div className="sc-figure-head">
                  <strong>{hypothesis?.name ?? 'No hypothesis'}</strong>
                  <FigureExportButtons figure={primaryFigure} title={figureTitle(hypothesis?.name)} />
                </div>
                {renderFigure(hypothesis, primaryFigure)}
              </section>
              {secondId && (
                <section>
                  <div className="sc-figure-head">
                    <strong>{second?.name ?? '…'}</strong>
                    <FigureExportButtons figure={secondFigure} title={figureTitle(second?.name)} />
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
                <Tab id="regional" title={`Regional events (${hypothesis.regionalEvents.length})`} panel={<RegionalEventsPanel hypothesis={hypothesis} eventLabels={eventNames} />} />
                <Tab
                  id="joint"
                  title={hypothesis.latestJointRun ? `Joint run (${hypothesis.latestJointRun.status.toLowerCase()})` : 'Joint run'}
                  panel={<JointRunPanel projectId={projectId} hypothesis={hypothesis} canRun={canEdit} eventLabels={eventNames} />}
                />
                <Tab
                  id="ties"
                  title={`Ties (${hypothesis.ties.length})`}
                  panel={
                    <TiesList
                      hypothesis={hypothesis}
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
            <p className="sc-chart-legend">
              Wheel to zoom the time axis, drag to pan, double-click to reset. Shapes are scaled to their own peak; bands span the combined 95.4 %
              range. Dashed orange ties cross another tie's order; an order loop is drawn in a long-short dash with its label. Ages in {ageScaleLabel(scale)}.
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
