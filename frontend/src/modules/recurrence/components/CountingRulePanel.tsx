import { Callout, InputGroup, Intent, Switch } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useQuery } from '@tanstack/react-query';
import { useEffect, useState, type ChangeEvent } from 'react';
import type { CountingRuleInput } from '@/gql/graphql';
import { graphqlRequest } from '@/modules/api/utils/graphqlClient';
import { EventTable } from '@/modules/recurrence/components/EventTable';
import { SegmentEventTableDocument } from '@/modules/recurrence/graphql/eventCounting';
import { recurrenceQueries } from '@/modules/recurrence/hooks/recurrenceQueries';
import { GRADES, readCountingRule, type CountingRuleForm } from '@/modules/recurrence/utils/eventCounting';
import { NumberField } from '@/modules/ui/components/FormFields';
import { LoadingState } from '@/modules/ui/components/LoadingState';
import './eventCounting.css';

/** Wait this long after the last keystroke before asking for the table again. */
const PREVIEW_DELAY_MS = 400;

function useSettled<T>(value: T, delayMs: number): T {
  const [settled, setSettled] = useState(value);
  useEffect(() => {
    const timer = setTimeout(() => setSettled(value), delayMs);
    return () => clearTimeout(timer);
  }, [value, delayMs]);
  return settled;
}

type WeightRowProps = { label: string; values: string[]; invalid: boolean; onChange: (values: string[]) => void };

function WeightRow({ label, values, invalid, onChange }: WeightRowProps) {
  return (
    <>
      <span>{label}</span>
      {GRADES.map((grade, i) => {
        const handleChange = (event: ChangeEvent<HTMLInputElement>) => onChange(values.map((value, j) => (j === i ? event.target.value : value)));
        return (
          <InputGroup
            key={grade}
            small
            value={values[i]}
            onChange={handleChange}
            intent={invalid ? Intent.DANGER : Intent.NONE}
            aria-label={`${label} ${grade}`}
            inputMode="decimal"
          />
        );
      })}
    </>
  );
}

export type CountingRulePanelProps = {
  projectId: string;
  segmentId: string;
  hypothesisId: string;
  /** A second hypothesis whose table is shown beside the first, under the same rule. */
  secondHypothesisId?: string | null;
  form: CountingRuleForm;
  onChange: (form: CountingRuleForm) => void;
};

/**
 * Which of the segment's events count, chosen before the analysis runs, with the event table
 * the analysis would use under the chosen hypothesis and rule.
 */
export function CountingRulePanel({ projectId, segmentId, hypothesisId, secondHypothesisId = null, form, onChange }: CountingRulePanelProps) {
  const read = readCountingRule(form);
  const errors = read.ok ? {} : read.errors;
  const rule: CountingRuleInput | null = read.ok ? read.input : null;
  const tableQuery = useEventTable(projectId, segmentId, hypothesisId, rule);
  const secondQuery = useEventTable(projectId, segmentId, secondHypothesisId ?? '', rule);
  const handleUntied = (event: ChangeEvent<HTMLInputElement>) => onChange({ ...form, includeUntied: event.target.checked });
  const handleWeighted = (event: ChangeEvent<HTMLInputElement>) => onChange({ ...form, weighted: event.target.checked });
  const handleShare = (value: string) => onChange({ ...form, spanSharePercent: value });
  const handleQuality = (values: string[]) => onChange({ ...form, qualityWeights: values });
  const handleConfidence = (values: string[]) => onChange({ ...form, confidenceWeights: values });

  return (
    <div className="sc-counting">
      <h4>Which events count</h4>
      <div className="sc-counting-rule">
        <NumberField
          name="spanSharePercent"
          label="Tied events spanning at least"
          unit="% of segment"
          value={form.spanSharePercent}
          onValueChange={handleShare}
          error={errors.spanSharePercent}
          helperText="0: every tied event recorded on the segment, partial or through-going"
        />
        <Switch checked={form.includeUntied} onChange={handleUntied} label="Count untied single-site events" />
        <Switch checked={form.weighted} onChange={handleWeighted} label="Inclusion weights" />
      </div>
      {form.weighted && (
        <>
          <div className="sc-counting-weights" role="group" aria-label="Inclusion weights">
            <span />
            {GRADES.map((grade) => (
              <span key={grade} className="sc-chart-legend">
                {grade}
                {grade === 1 ? ' (certain)' : grade === 4 ? ' (possible)' : ''}
              </span>
            ))}
            <WeightRow label="Horizon quality" values={form.qualityWeights} invalid={errors.qualityWeights !== undefined} onChange={handleQuality} />
            <WeightRow label="Tie confidence" values={form.confidenceWeights} invalid={errors.confidenceWeights !== undefined} onChange={handleConfidence} />
          </div>
          <p className="sc-chart-legend">
            Each weight is a probability (0–1) that an event of that grade is a real earthquake on this segment; an event&apos;s probability is its best
            member&apos;s quality weight times its weakest tie&apos;s confidence weight. {errors.qualityWeights ?? errors.confidenceWeights ?? ''}
          </p>
        </>
      )}
      <div className={secondHypothesisId ? 'sc-recurrence-compare' : undefined}>
        <TablePreview query={tableQuery} caption={secondHypothesisId ? 'The events this analysis would use (A)' : 'The events this analysis would use'} />
        {secondHypothesisId && <TablePreview query={secondQuery} caption="Under the second hypothesis (B)" />}
      </div>
    </div>
  );
}

/** The event table of a segment under a hypothesis and rule, asked again once typing settles. */
function useEventTable(projectId: string, segmentId: string, hypothesisId: string, rule: CountingRuleInput | null) {
  const request = useSettled(JSON.stringify({ segmentId, hypothesisId, rule }), PREVIEW_DELAY_MS);
  const parsed = JSON.parse(request) as { segmentId: string; hypothesisId: string; rule: CountingRuleInput | null };
  return useQuery({
    queryKey: [...recurrenceQueries.all(projectId), 'event-table', request] as const,
    queryFn: async () =>
      (await graphqlRequest(SegmentEventTableDocument, { input: { segmentId: parsed.segmentId, hypothesisId: parsed.hypothesisId, countingRule: parsed.rule } }))
        .segmentEventTable,
    enabled: parsed.segmentId !== '' && parsed.hypothesisId !== '' && parsed.rule !== null,
    placeholderData: (previous) => previous,
  });
}

function TablePreview({ query, caption }: { query: ReturnType<typeof useEventTable>; caption: string }) {
  if (query.isError) {
    return (
      <Callout intent={Intent.WARNING} icon={IconNames.WARNING_SIGN}>
        {query.error.message}
      </Callout>
    );
  }
  if (query.data) return <EventTable table={query.data} caption={caption} />;
  return query.isFetching ? <LoadingState label="Reading the segment's events" /> : null;
}
