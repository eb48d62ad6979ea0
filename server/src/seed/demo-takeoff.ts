import type { TenantTx } from '@layerbook/db';

/** Invented demo rooms and surfaces for a demo site (being built). */
export async function seedDemoTakeoff(_tx: TenantTx, _siteId: string): Promise<void> {}
