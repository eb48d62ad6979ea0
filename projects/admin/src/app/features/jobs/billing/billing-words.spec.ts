import { describe, expect, it } from 'vitest';
import {
  changeOrdersNet,
  depositCapWords,
  invoiceWords,
  lineStatus,
  retainageWords,
  serverSaid,
  sumDifferenceWords,
  triggerWords,
} from './billing-words';

describe('sumDifferenceWords (the schedule against the contract sum, exact minor units)', () => {
  it.each([
    [['4000.00', '6000.00'], '10000.00', true, 'The lines add up to the contract sum of $10,000.00.'],
    [['4000', '5,990'], '10000.00', false, 'The lines add up to $9,990.00: $10.00 short of the contract sum of $10,000.00.'],
    [['0.10', '0.20'], '0.29', false, 'The lines add up to $0.30: $0.01 over the contract sum of $0.29.'],
    [['', '12000.00'], '12000.00', true, 'The lines add up to the contract sum of $12,000.00.'],
  ])('%j against %s: exact %s, "%s"', (typed, contractSum, isExact, text) => {
    expect(sumDifferenceWords(typed, contractSum, 'USD', 'en-US')).toEqual({ isExact, text });
  });

  it.each([[['12.345']], [['ten']], [['-5']]])('says nothing while an amount is not one yet (%j: its field says why)', (typed) => {
    expect(sumDifferenceWords(typed, '100.00', 'USD', 'en-US')).toBeNull();
  });

  it('counts in the currency minor units (yen has none)', () => {
    expect(sumDifferenceWords(['1000', '999'], '2000', 'JPY', 'en-US')?.text).toBe(
      'The lines add up to ¥1,999: ¥1 short of the contract sum of ¥2,000.',
    );
    expect(sumDifferenceWords(['1000.50'], '2000', 'JPY', 'en-US')).toBeNull();
  });
});

describe('depositCapWords (the deposit against the cap of the firm rule, by its name)', () => {
  const rule = 'California home improvement contracts: the lesser of $1,000 or 10 %';

  it('names the rule and says by how much a deposit is over its cap', () => {
    // DOMAIN.md §2.11: a $12,000 job under the California rule caps the deposit at $1,000.
    expect(depositCapWords(['1200.00'], '1000.00', rule, 'USD', 'en-US')).toEqual({
      isWithin: false,
      text: `The deposit of $1,200.00 is $200.00 over $1,000.00, the cap under “${rule}”.`,
    });
  });

  it('adds every deposit line, and a deposit at the cap is within it', () => {
    expect(depositCapWords(['600', '400'], '1000.00', rule, 'USD', 'en-US')).toEqual({
      isWithin: true,
      text: `The deposit of $1,000.00 is within $1,000.00, the cap under “${rule}”.`,
    });
  });

  it('says a rule without a cap sets none, once', () => {
    expect(depositCapWords(['5000'], null, 'No deposit limit', 'USD', 'en-US')).toEqual({
      isWithin: true,
      text: 'The deposit of $5,000.00 has no cap under “No deposit limit”.',
    });
  });

  it('waits for a typed amount to be one', () => {
    expect(depositCapWords(['1.2.3'], '1000.00', rule, 'USD', 'en-US')).toBeNull();
  });
});

describe('triggerWords (what makes a line due)', () => {
  it.each([
    [{ kind: 'acceptance' }, null, 'When billing starts'],
    [{ kind: 'date', date: '2026-12-14' }, null, 'On Dec 14, 2026'],
    [{ kind: 'layerComplete', layerId: 'l1' }, 'Lime base coat', 'When Lime base coat is finished on every surface'],
    [{ kind: 'layerComplete', layerId: 'gone' }, null, 'When the chosen layer is finished on every surface'],
    [{ kind: 'walkthrough' }, null, 'At the final walkthrough'],
  ] as const)('%j (layer %j) reads "%s"', (trigger, layerName, words) => {
    expect(triggerWords(trigger, layerName, 'en-US')).toBe(words);
  });
});

describe('job figures and rows', () => {
  it('nets the approved change orders from the contract sum to date, exactly', () => {
    // DOMAIN.md §2.10 worked example: 48,000 original, change order #1 +3,200 → 51,200.
    expect(changeOrdersNet('51200.00', '48000.00', 'USD')).toBe('3200.00');
    expect(changeOrdersNet('47999.99', '48000.00', 'USD')).toBe('-0.01');
  });

  it('shows a draft invoice as "Draft" and an overdue one as overdue, in words', () => {
    expect(invoiceWords({ number: null, kind: 'progress', status: 'draft', isOverdue: false })).toEqual({
      number: 'Draft',
      kind: 'Progress invoice',
      status: 'Draft — not sent',
    });
    expect(invoiceWords({ number: 'INV-0007', kind: 'milestone', status: 'part_paid', isOverdue: true })).toEqual({
      number: 'INV-0007',
      kind: 'Stage payment',
      status: 'Part paid · overdue',
    });
  });

  it.each([
    ['draft', 'Not started'],
    ['scheduled', 'Waiting for its trigger'],
    ['ready', 'Ready to bill'],
    ['invoiced', 'Invoiced'],
  ] as const)('a %s line reads "%s"', (status, word) => {
    expect(lineStatus(status).word).toBe(word);
  });
});

describe('retainageWords', () => {
  it.each([
    [{ workPercent: 0, storedPercent: 0, stopAtPercentComplete: null }, 'None held'],
    [
      { workPercent: 10, storedPercent: 10, stopAtPercentComplete: null },
      '10 % of work and 10 % of materials stored on site, held to the end of the job',
    ],
    // Retainage may step down after half the work (DOMAIN.md §2.10, R20).
    [
      { workPercent: 10, storedPercent: 5, stopAtPercentComplete: 50 },
      '10 % of work and 5 % of materials stored on site, no more held once the job is 50 % complete',
    ],
  ])('%j reads "%s"', (r, words) => {
    expect(retainageWords(r)).toBe(words);
  });
});

describe('serverSaid (a server error on a control no field shows)', () => {
  it('answers the server words, or null', () => {
    expect(serverSaid({ errors: { server: 'A job billed by progress has at most one deposit line.' } })).toBe(
      'A job billed by progress has at most one deposit line.',
    );
    expect(serverSaid({ errors: { required: true } })).toBeNull();
    expect(serverSaid({ errors: null })).toBeNull();
  });
});
