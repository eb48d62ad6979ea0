import { describe, expect, it } from 'vitest';
import type { FinishLayer } from '@layerbook/domain';
import {
  clockText,
  dayAndClock,
  dayWords,
  finishOutlineText,
  multiplierChain,
  percentText,
  readOnlyReason,
  SAVED_WORDS,
  statusWord,
} from './estimate-words';

const layer = (waitHoursAfter: number) => ({ productId: 'p', waitHoursAfter }) as FinishLayer;

describe('estimate words', () => {
  it('names statuses with the contract labels', () => {
    expect(statusWord('proposed')).toBe('Proposal sent');
  });

  it('says a save keeps the figures on record, not "the server\'s numbers"', () => {
    expect(SAVED_WORDS).toBe('Saved — these are the figures on record.');
  });

  it.each([
    ['draft' as const, null],
    ['proposed' as const, null],
    ['declined' as const, null],
    ['accepted' as const, expect.stringContaining('Changes go through a change order.')],
  ])('an estimate that is %s is read-only: %s', (status, reason) => expect(readOnlyReason(status)).toEqual(reason));

  it.each([
    [[], 'no extra time'],
    [[{ name: 'ceiling' as const, factor: 1.25 }], 'ceiling ×1.25'],
    [
      [
        { name: 'curvedCeiling' as const, factor: 1.5 },
        { name: 'occupied' as const, factor: 1.1 },
      ],
      'dome or vault ×1.5 · occupied home ×1.1',
    ],
    [[{ name: 'height' as const, factor: 1.33333 }], 'high work ×1.333'],
  ])('multiplierChain(%j) is %s', (chain, text) => expect(multiplierChain(chain)).toBe(text));

  it.each([
    [[layer(4), layer(72), layer(24)], '3 layers · waits 100 h (4 days 4 h)'],
    [[layer(0)], '1 layer · no waits'],
  ])('finishOutlineText sums the waits as the library does: %s', (layers, text) => expect(finishOutlineText(layers)).toBe(text));

  it.each([
    ['0.5385', '53.9%'],
    ['0.2', '20%'],
  ])('percentText(%s) is %s', (ratio, text) => expect(percentText(ratio, 'en-US')).toBe(text));

  it.each([
    [8, '8:00 AM'],
    [8.5, '8:30 AM'],
    [15.16, '3:10 PM'],
    [12.875, '12:53 PM'],
  ])('clockText(%d) is %s', (hour, text) => expect(clockText(hour, 'en-US')).toBe(text));

  it("writes a calendar day without shifting it by the viewer's time zone", () => {
    expect(dayWords('2025-06-10', 'en-US')).toBe('Tuesday, Jun 10');
    expect(dayAndClock('2025-06-11', 8.25, 'en-US')).toBe('Wed, Jun 11, 8:15 AM');
  });
});
