import type { WorkItemView } from '@layerbook/contracts/types';
import { describe, expect, it } from 'vitest';
import { groupWork } from './work-groups';

function item(
  id: string,
  position: number,
  roomName: string,
  surfaceId: string,
  layerName: string,
  layerOrder: number,
  doneOn: string | null = null,
  changeOrder: number | null = null,
) {
  return {
    id,
    position,
    roomName,
    surfaceId,
    surfaceName: surfaceId === 'dome' ? 'Dome' : 'Walls',
    layerId: layerName,
    layerName,
    layerOrder,
    doneOn,
    changeOrder,
  } satisfies WorkItemView;
}

describe('groupWork (room, then surface, then the layers in order)', () => {
  it('keeps rooms and surfaces in job order and each surface layers in the order they go on', () => {
    const groups = groupWork([
      item('a', 4, 'Hall', 'dome', 'Glaze', 2),
      item('b', 1, 'Dining room', 'walls', 'Glaze', 2),
      item('c', 2, 'Dining room', 'walls', 'Base', 1, '2026-12-10'),
      item('d', 3, 'Hall', 'dome', 'Base', 1),
    ]);
    expect(groups.map((r) => r.roomName)).toEqual(['Dining room', 'Hall']);
    expect(groups[0].surfaces[0].items.map((i) => i.layerName)).toEqual(['Base', 'Glaze']);
    expect(groups[0].surfaces[0].doneCount).toBe(1);
    expect(groups[1].surfaces).toEqual([expect.objectContaining({ surfaceId: 'dome', surfaceName: 'Dome', doneCount: 0 })]);
  });

  it('keeps a change order’s redo of a sold surface apart from the sold layers', () => {
    const groups = groupWork([
      item('a', 1, 'Dining room', 'walls', 'Base', 1, '2026-12-10'),
      item('b', 2, 'Dining room', 'walls', 'Glaze', 2, '2026-12-11'),
      item('c', 3, 'Dining room', 'walls', 'Base', 1, null, 2),
      item('d', 4, 'Dining room', 'walls', 'Glaze', 2, null, 2),
    ]);
    expect(groups[0].surfaces.map((s) => [s.surfaceId, s.changeOrder, s.items.map((i) => i.id), s.doneCount])).toEqual([
      ['walls', null, ['a', 'b'], 2],
      ['walls', 2, ['c', 'd'], 0],
    ]);
  });

  it('has nothing to show for a job without work items', () => {
    expect(groupWork([])).toEqual([]);
  });
});
