import type { WorkItemView } from '@layerbook/contracts/types';

export interface SurfaceWork {
  readonly surfaceId: string;
  readonly surfaceName: string;
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
 * job lists them), each surface's layers in the order they go on.
 */
export function groupWork(items: readonly WorkItemView[]): RoomWork[] {
  const sorted = [...items].sort((a, b) => a.position - b.position);
  const rooms = new Map<string, Map<string, WorkItemView[]>>();
  for (const item of sorted) {
    const surfaces = rooms.get(item.roomName) ?? new Map<string, WorkItemView[]>();
    rooms.set(item.roomName, surfaces);
    const list = surfaces.get(item.surfaceId) ?? [];
    surfaces.set(item.surfaceId, list);
    list.push(item);
  }
  return [...rooms.entries()].map(([roomName, surfaces]) => ({
    roomName,
    surfaces: [...surfaces.entries()].map(([surfaceId, list]) => {
      const layers = [...list].sort((a, b) => a.layerOrder - b.layerOrder || a.position - b.position);
      return { surfaceId, surfaceName: layers[0].surfaceName, items: layers, doneCount: layers.filter((i) => i.doneOn !== null).length };
    }),
  }));
}
