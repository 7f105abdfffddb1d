import { describe, expect, it } from 'vitest';
import { defaultCountingRule, extentLabel, readCountingRule } from '@/modules/recurrence/utils/eventCounting';

describe('readCountingRule', () => {
  it('turns the default form into the server default: every tied event, untied out, no weights', () => {
    expect(readCountingRule(defaultCountingRule())).toEqual({
      ok: true,
      input: { minimumSpanShare: 0, includeUntied: false, qualityWeights: null, confidenceWeights: null },
    });
  });

  it('reads a share in per cent and weights as probabilities, a decimal comma too', () => {
    const result = readCountingRule({
      ...defaultCountingRule(),
      spanSharePercent: '50',
      includeUntied: true,
      weighted: true,
      qualityWeights: ['1', '0,9', '0.6', '0.3'],
    });
    expect(result).toEqual({
      ok: true,
      input: { minimumSpanShare: 0.5, includeUntied: true, qualityWeights: [1, 0.9, 0.6, 0.3], confidenceWeights: [1, 1, 1, 1] },
    });
  });

  it('names the field of a share above 100 % or a weight that is not a probability', () => {
    const result = readCountingRule({ ...defaultCountingRule(), spanSharePercent: '120', weighted: true, confidenceWeights: ['1', '1.5', '', '0'] });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(Object.keys(result.errors).sort()).toEqual(['confidenceWeights', 'spanSharePercent']);
  });
});

describe('extentLabel', () => {
  it('tells through-going, partial and single-site events apart', () => {
    const members = (...sites: string[]) => sites.map((siteId) => ({ siteId }));
    expect(extentLabel({ throughGoing: true, untied: false, members: members('a', 'b') })).toBe('through-going');
    expect(extentLabel({ throughGoing: false, untied: false, members: members('a', 'b') })).toBe('partial');
    expect(extentLabel({ throughGoing: false, untied: true, members: members('a') })).toBe('single site, untied');
  });
});
