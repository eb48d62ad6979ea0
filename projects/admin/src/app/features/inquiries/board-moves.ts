import type { BoardColumn, InquiryStage, InquirySummary } from '@layerbook/contracts/types';

/**
 * The board after one card moves: it leaves its column and goes on top of the new one, and both
 * counts follow. Pure, so the board can show a move at once and put it back if the server refuses.
 */
export function moveCard(columns: readonly BoardColumn[], card: InquirySummary, stage: InquiryStage): BoardColumn[] {
  const moved: InquirySummary = { ...card, stage };
  return columns.map((column) => {
    const without = column.items.filter((item) => item.id !== card.id);
    if (column.stage === stage) {
      return { ...column, count: column.count + 1, items: [moved, ...without] };
    }
    if (column.stage === card.stage) {
      return { ...column, count: Math.max(0, column.count - 1), items: without };
    }
    return column;
  });
}

/** Swaps in what the server now says about one card, wherever it sits. */
export function replaceCard(columns: readonly BoardColumn[], saved: InquirySummary): BoardColumn[] {
  return columns.map((column) => ({
    ...column,
    items: column.items.map((item) => (item.id === saved.id ? saved : item)),
  }));
}
