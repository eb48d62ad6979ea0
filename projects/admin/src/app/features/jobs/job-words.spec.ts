import { describe, expect, it } from 'vitest';
import { jobStatus, paymentStatus, paymentWhen } from './job-words';

describe('job words', () => {
  it.each([
    ['scheduled', 'Scheduled', 'event'],
    ['in_progress', 'Under way', 'format_paint'],
    ['complete', 'Finished', 'task_alt'],
    ['cancelled', 'Cancelled', 'block'],
  ] as const)('job %s reads "%s" with an icon', (status, word, icon) => {
    expect(jobStatus(status)).toEqual({ word, icon });
  });

  it.each([
    ['draft', 'Draft'],
    ['scheduled', 'Scheduled'],
    ['invoiced', 'Invoiced'],
  ] as const)('payment %s reads "%s"', (status, word) => {
    expect(paymentStatus(status).word).toBe(word);
  });

  it.each([
    [{ kind: 'acceptance' }, 'On acceptance'],
    [{ kind: 'layerComplete', layerId: 'base' }, 'When the base coats are done'],
    [{ kind: 'walkthrough' }, 'On completion, after the walk-through'],
  ] as const)('a payment triggered by %j falls due "%s"', (trigger, words) => {
    expect(paymentWhen({ trigger })).toBe(words);
  });
});
