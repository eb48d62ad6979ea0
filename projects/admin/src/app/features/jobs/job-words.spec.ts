import { describe, expect, it } from 'vitest';
import { jobStatus, paymentLine, paymentStatus } from './job-words';

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
    ['deposit', { kind: 'acceptance' }, null, 'Deposit on acceptance'],
    ['milestone', { kind: 'layerComplete', layerId: 'base' }, 'Base coat', 'Progress payment when Base coat is finished on every surface'],
    ['milestone', { kind: 'layerComplete', layerId: 'gone' }, null, 'Progress payment when the chosen layer is finished on every surface'],
    ['final', { kind: 'walkthrough' }, null, 'Final payment on completion, after the walkthrough'],
  ] as const)('a %s payment triggered by %j (layer %j) is named "%s", as the proposal names it', (role, trigger, layerName, words) => {
    expect(paymentLine({ role, trigger, layerName })).toBe(words);
  });

  it('never speaks of "base coats" when the trigger names another layer', () => {
    const words = paymentLine({ role: 'milestone', trigger: { kind: 'layerComplete', layerId: 'primer' }, layerName: 'Primer' });
    expect(words).not.toMatch(/base coats/i);
    expect(words).toContain('Primer');
  });
});
