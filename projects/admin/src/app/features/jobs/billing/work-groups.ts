import type { WorkItemView } from '@layerbook/contracts/types';

export interface SurfaceWork {
  readonly surfaceId: string;
  readonly surfaceName: string;
  /** the change order that added this work (a redo of a sold surface is apart from the sold layers); null: sold */
  readonly changeOrder: number | null;
  /** the layers on this surface in the order they go on */
  readonly items: readonly WorkItemView[];
  readonly doneCount: number;
}

export interface RoomWork {
  readonly roomName: string;
  readonly surfaces: readonly SurfaceWork[];
}

/**
 * The job's work items as the crew walks them: room by room, surface by surface (in the order the
 * job lists them), each surface's layers in the order they go on. A change order's work on a surface
 * is a group of its own, so its layers never read as the sold ones.
 */
export function groupWork(items: readonly WorkItemView[]): RoomWork[] {
  const sorted = [...items].sort((a, b) => a.position - b.position);
  const rooms = new Map<string, Map<string, WorkItemView[]>>();
  for (const item of sorted) {
    const surfaces = rooms.get(item.roomName) ?? new Map<string, WorkItemView[]>();
    rooms.set(item.roomName, surfaces);
    const key = `${item.changeOrder ?? 'sold'}/${item.surfaceId}`;
    const list = surfaces.get(key) ?? [];
    surfaces.set(key, list);
    list.push(item);
  }
  return [...rooms.entries()].map(([roomName, surfaces]) => ({
    roomName,
    surfaces: [...surfaces.values()].map((list) => {
      const layers = [...list].sort((a, b) => a.layerOrder - b.layerOrder || a.position - b.position);
      const first = layers[0];
      return {
        surfaceId: first.surfaceId,
        surfaceName: first.surfaceName,
        changeOrder: first.changeOrder,
        items: layers,
        doneCount: layers.filter((i) => i.doneOn !== null).length,
      };
    }),
  }));
}
