import type { TenantTx } from '@layerbook/db';

/** Invented demo products and finish systems (being built). */
export async function seedDemoLibrary(_tx: TenantTx): Promise<void> {}
