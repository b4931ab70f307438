import type { CheckResult, CircuitTestAssessment } from '@wiretrail/core';

/** A circuit's tests taken together, in the shape of one check, so that its verdict opens like any other. */
export function overallResult(a: CircuitTestAssessment): CheckResult {
  const failing = a.failing.length ? `Failing: ${a.failing.map((l) => l.label).join('; ')}.` : '';
  const missing = a.missing.length ? `Still to record: ${a.missing.map((l) => l.label).join('; ')}.` : '';
  // A figure no instrument shows is a slip, not a fail: it is named, and left unjudged.
  const notJudged = a.notJudged.length ? `Not judged: ${a.notJudged.map((l) => l.label).join('; ')}.` : '';
  return {
    verdict: a.verdict,
    value: null,
    limit: null,
    unit: '',
    source: `Each test's own limit, from the rule set ${a.ruleSetId}`,
    note: [failing, missing, notJudged].filter(Boolean).join(' ') || 'Every required test is within its limit.',
  };
}
