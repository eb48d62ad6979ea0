import type { BoardColumn, InquiryStage, InquirySummary } from '@layerbook/contracts/types';
import { describe, expect, it } from 'vitest';
import { moveCard, replaceCard } from './board-moves';

function card(id: string, stage: InquiryStage): InquirySummary {
  return {
    id,
    contactName: `Prospect ${id}`,
    email: '',
    phone: '',
    siteAddress: '',
    stage,
    source: 'phone',
    referrerName: '',
    estimatedValue: null,
    assigneeUserId: null,
    assigneeName: null,
    nextFollowUp: null,
    isFollowUpOverdue: false,
    createdAt: '2026-03-01T10:00:00.000Z',
  };
}

function column(stage: InquiryStage, items: InquirySummary[], count = items.length): BoardColumn {
  return { stage, label: stage, likelihoodPercent: 10, count, items };
}

const a = card('a', 'new');
const b = card('b', 'new');
const c = card('c', 'contacted');
const board = [column('new', [a, b]), column('contacted', [c]), column('won', [], 12)];

describe('moveCard', () => {
  it.each([
    ['to an empty column', 'a', 'won', { new: ['b'], contacted: ['c'], won: ['a'] }, { new: 1, contacted: 1, won: 13 }],
    ['on top of a full one', 'b', 'contacted', { new: ['a'], contacted: ['b', 'c'], won: [] }, { new: 1, contacted: 2, won: 12 }],
  ] as const)('moves a card %s, counts following', (_case, id, stage, items, counts) => {
    const moved = moveCard(board, id === 'a' ? a : b, stage);
    expect(Object.fromEntries(moved.map((col) => [col.stage, col.items.map((i) => i.id)]))).toEqual(items);
    expect(Object.fromEntries(moved.map((col) => [col.stage, col.count]))).toEqual(counts);
    expect(moved.find((col) => col.stage === stage)?.items[0]?.stage).toBe(stage);
  });

  it('never counts below zero when the server count was stale', () => {
    const stale = [column('new', [a], 0), column('won', [])];
    expect(moveCard(stale, a, 'won')[0]?.count).toBe(0);
  });

  it('leaves the board it was given alone', () => {
    moveCard(board, a, 'won');
    expect(board[0]?.items.map((i) => i.id)).toEqual(['a', 'b']);
  });
});

describe('replaceCard', () => {
  it('swaps in the saved card wherever it sits, and nothing else', () => {
    const saved = { ...c, contactName: 'Renamed' };
    const replaced = replaceCard(board, saved);
    expect(replaced[1]?.items[0]?.contactName).toBe('Renamed');
    expect(replaced[0]?.items).toEqual(board[0]?.items);
  });
});
