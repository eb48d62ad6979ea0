import type { JobPhotoView, JobSheet, SheetFinish, SheetProduct, SheetRoom, SheetSurface, WorkItemView } from '@layerbook/contracts';
import { type PlannedSchedule, planDays } from '@layerbook/domain';
import type { SheetSource } from './load-sheet';
import { sheetCautions, withCrewLead } from './sheet-cautions';

/**
 * The crew's job sheet from what was sold: rooms and surfaces in the proposal's order with their
 * measured sizes, each surface's layers with their work item and material need, the finishes' layers
 * in order, the products with their hazard flags, the dated day plan, the cautions and the approved change orders (the surfaces
 * they add are in their rooms, marked with their number, after the work sold). The source
 * holds no money, and nothing here adds any. Pure.
 */
export function buildSheet(src: SheetSource, workItems: readonly WorkItemView[], photos: readonly JobPhotoView[]): JobSheet {
  const surfaces = src.result?.surfaces ?? [];
  // A change order redoing a sold surface has layers of its own: the key names the change order too.
  const keyOf = (surfaceId: string, layerId: string, changeOrder: number | null) => `${changeOrder ?? 'sold'}/${surfaceId}/${layerId}`;
  const items = new Map(workItems.map((w) => [keyOf(w.surfaceId, w.layerId, w.changeOrder), w]));

  const toSurface = (s: (typeof surfaces)[number], changeOrder: number | null = null): SheetSurface => ({
    id: s.surfaceId,
    changeOrder,
    name: s.name,
    finishId: s.finishSystemId,
    measure: s.measure.measure,
    quantity: s.measure.quantity,
    gross: s.measure.gross,
    deductions: s.measure.deductions,
    formula: s.measure.formula,
    isCeiling: s.measure.isCeiling,
    isCurved: s.measure.isCurved,
    topHeight: s.measure.topHeight,
    layers: s.layers.map((layer) => {
      const item = items.get(keyOf(s.surfaceId, layer.layerId, changeOrder));
      return {
        layerId: layer.layerId,
        name: layer.name,
        workItemId: item?.id ?? null,
        doneOn: item?.doneOn ?? null,
        products: layer.quantity.products.map((p) => ({ productId: p.productId, quantity: p.amount })),
        water: layer.quantity.water,
      };
    }),
  });

  // The proposal's room and surface order; anything it does not list follows in the result's order.
  const far = Number.MAX_SAFE_INTEGER;
  const roomOrder = new Map(src.scope.map((room, i) => [room.id, i]));
  const surfaceOrder = new Map(src.scope.flatMap((room) => room.surfaces.map((s, i) => [s.id, i] as const)));
  const scopeNames = new Map(src.scope.map((room) => [room.id, room.name]));
  // A change order's surfaces follow the sold ones of their room; a room only they reach comes after the sold rooms.
  const roomIds = [...new Set([...surfaces, ...src.added.map((a) => a.surface)].map((s) => s.roomId))].sort(
    (a, b) => (roomOrder.get(a) ?? far) - (roomOrder.get(b) ?? far),
  );
  const rooms: SheetRoom[] = roomIds.map((roomId) => ({
    id: roomId,
    name: scopeNames.get(roomId) ?? src.roomNames.get(roomId) ?? '',
    surfaces: [
      ...surfaces
        .filter((s) => s.roomId === roomId)
        .sort((a, b) => (surfaceOrder.get(a.surfaceId) ?? far) - (surfaceOrder.get(b.surfaceId) ?? far))
        .map((s) => toSurface(s)),
      ...src.added.filter((a) => a.surface.roomId === roomId).map((a) => toSurface(a.surface, a.changeOrder)),
    ],
  }));

  const usedSystems = new Set([...surfaces, ...src.added.map((a) => a.surface)].map((s) => s.finishSystemId));
  const finishes: SheetFinish[] = src.finishSystems
    .filter((f) => usedSystems.has(f.id))
    .map((f) => ({
      id: f.id,
      name: f.name,
      layers: f.layers.map((layer) => ({
        id: layer.id,
        name: layer.name,
        method: layer.method,
        productId: layer.productId ?? null,
        recipe: layer.recipe ?? null,
        dilution: layer.dilution ?? null,
        coats: layer.coats,
        coverage: layer.coverage,
        ...(layer.coatCoverages ? { coatCoverages: layer.coatCoverages } : {}),
        coverageShare: layer.coverageShare ?? 1,
        waitHoursAfter: layer.waitHoursAfter,
      })),
    }));

  const products: SheetProduct[] = src.products.map((p) => ({ id: p.id, name: p.name, unit: p.unit, hazards: p.hazards ?? {} }));
  const schedule: PlannedSchedule | undefined = src.result?.schedule;

  return {
    id: src.job.id,
    title: src.job.title,
    siteAddress: src.job.siteAddress,
    status: src.job.status,
    startDate: src.job.startDate,
    finishDate: src.job.finishDate,
    units: src.firm.units,
    lengthUnit: src.lengthUnit,
    timeZone: src.firm.timeZone,
    firmCountry: src.firm.country,
    rooms,
    finishes,
    products,
    dayPlan: schedule ? planDays(schedule) : [],
    cautions: sheetCautions(withCrewLead(src.cautions, src.result?.lead, src.firm.country), src.firm.country),
    changes: src.changes,
    workItems,
    photos,
    sourceLanguage: 'en',
  };
}
