import type { SurfaceShapeInput } from '@layerbook/contracts';
import { rooms, surfaces, type TenantTx } from '@layerbook/db';
import { measureSurface } from '@layerbook/domain';

interface DemoSurface {
  readonly name: string;
  readonly shape: SurfaceShapeInput;
  readonly disturbedPaintedArea?: number;
  readonly notes?: string;
}

/** Invented rooms for the demo house (feet: the demo firm works in imperial). Every size is made up. */
const DEMO_ROOMS: readonly { name: string; notes: string; surfaces: readonly DemoSurface[] }[] = [
  {
    name: 'Round sitting room',
    notes: 'Turret room off the front hall; old paint on the window trim.',
    surfaces: [
      {
        name: 'Round walls',
        shape: {
          kind: 'roundWalls',
          radius: 7,
          height: 10,
          openings: [
            { width: 3, height: 7, count: 1 },
            { width: 3, height: 5, count: 2 },
          ],
        },
        disturbedPaintedArea: 4,
        notes: 'Scrape and feather the window trim edges before the scratch coat.',
      },
      { name: 'Turret ceiling', shape: { kind: 'cone', radius: 7, rise: 6, elevation: 10 } },
      { name: 'Crown at the wall top', shape: { kind: 'crownCircular', radius: 7, elevation: 10 } },
    ],
  },
  {
    name: 'Stair hall',
    notes: 'Landing halfway up; scaffold tower needed for the vault.',
    surfaces: [
      { name: 'Hall walls', shape: { kind: 'walls', perimeter: 38, height: 11, openings: [{ width: 3, height: 7, count: 2 }] } },
      { name: 'Barrel vault', shape: { kind: 'barrelVault', radius: 4.5, length: 14, elevation: 12.5 } },
    ],
  },
];

/** Invented demo rooms and surfaces for the demo site; each shape is measured once so a bad seed fails loudly. */
export async function seedDemoTakeoff(tx: TenantTx, siteId: string): Promise<void> {
  for (const [roomPosition, room] of DEMO_ROOMS.entries()) {
    const [row] = await tx.db
      .insert(rooms)
      .values({ tenantId: tx.tenantId, siteId, name: room.name, notes: room.notes, position: roomPosition })
      .returning({ id: rooms.id });
    for (const [position, surface] of room.surfaces.entries()) {
      measureSurface(surface.shape);
      await tx.db.insert(surfaces).values({
        tenantId: tx.tenantId,
        roomId: row.id,
        name: surface.name,
        position,
        shape: surface.shape,
        lengthUnit: 'ft',
        disturbedPaintedArea: surface.disturbedPaintedArea === undefined ? null : String(surface.disturbedPaintedArea),
        notes: surface.notes ?? '',
      });
    }
  }
}
