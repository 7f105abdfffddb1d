/**
 * The counting rule of a segment analysis as typed (a share in per cent, untied events in or out,
 * optional inclusion weights by quality and tie confidence) and the API input it becomes; labels
 * of the event table and of the differences between two analyses.
 */
import type { CountingRuleInput, EventDifference } from '@/gql/graphql';
import { FieldReader, type FormResult } from '@/modules/ui/utils/formFields';

/** Grades of horizon quality and tie confidence, 1 (certain) to 4 (possible). */
export const GRADES = [1, 2, 3, 4] as const;

export type CountingRuleForm = {
  /** Minimum share of the segment's along-strike extent a tied event must span, per cent. */
  spanSharePercent: string;
  includeUntied: boolean;
  /** Whether inclusion weights are given at all. */
  weighted: boolean;
  /** Inclusion probability for quality 1-4. */
  qualityWeights: string[];
  /** Inclusion probability for tie confidence 1-4. */
  confidenceWeights: string[];
};

export type CountingRuleField = 'spanSharePercent' | 'qualityWeights' | 'confidenceWeights';

/** Every tied event counts, untied events out, no weights: the server's default too. */
export function defaultCountingRule(): CountingRuleForm {
  return { spanSharePercent: '0', includeUntied: false, weighted: false, qualityWeights: ['1', '1', '1', '1'], confidenceWeights: ['1', '1', '1', '1'] };
}

/** Check the rule: a share from 0 to 100 %, weights probabilities from 0 to 1. */
export function readCountingRule(form: CountingRuleForm): FormResult<CountingRuleInput, CountingRuleField> {
  const reader = new FieldReader<CountingRuleField>();
  const percent = reader.number('spanSharePercent', form.spanSharePercent, { required: true, min: 0, max: 100 });
  const weights = (field: 'qualityWeights' | 'confidenceWeights', texts: string[]) => {
    const values = texts.map((text) => {
      const value = Number(text.trim().replace(/^(\d*),(\d+)$/, '$1.$2'));
      return text.trim() !== '' && Number.isFinite(value) && value >= 0 && value <= 1 ? value : null;
    });
    if (values.some((value) => value === null)) reader.fail(field, 'each weight a probability from 0 to 1');
    return values.map((value) => value ?? 0);
  };
  const qualityWeights = form.weighted ? weights('qualityWeights', form.qualityWeights) : null;
  const confidenceWeights = form.weighted ? weights('confidenceWeights', form.confidenceWeights) : null;
  return reader.result({
    minimumSpanShare: (percent ?? 0) / 100,
    includeUntied: form.includeUntied,
    qualityWeights,
    confidenceWeights,
  });
}

/** How far along the segment an event is seen: through-going, partial, or at one site. */
export function extentLabel(row: { throughGoing: boolean; untied: boolean; members: readonly { siteId: string }[] }): string {
  if (row.throughGoing) return 'through-going';
  if (new Set(row.members.map((member) => member.siteId)).size === 1) return row.untied ? 'single site, untied' : 'single site';
  return 'partial';
}

export function formatShare(share: number): string {
  return `${Math.round(share * 100)} %`;
}

const DIFFERENCE_LABELS: Record<EventDifference, string> = {
  ONLY_IN_A: 'only in A',
  ONLY_IN_B: 'only in B',
  COUNTED_IN_A_ONLY: 'counted in A only',
  COUNTED_IN_B_ONLY: 'counted in B only',
  INCLUSION_CHANGED: 'probability changed',
  SAME: '',
};

export function differenceLabel(difference: EventDifference): string {
  return DIFFERENCE_LABELS[difference];
}
