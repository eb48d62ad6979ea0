import { type BillingSettings, DEFAULT_BILLING_SETTINGS } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';

/**
 * The firm's billing settings, or the defaults when the owner has not saved any.
 * OWNER: helper H2 (adds the view, the update and its routes beside this).
 */
export async function loadBillingSettings(tx: TenantTx): Promise<{ settings: BillingSettings; isDefault: boolean }> {
  const { rows } = await tx.client.query<{ settings: BillingSettings }>(`select settings from firm_billing_settings where tenant_id = $1`, [
    tx.tenantId,
  ]);
  return rows[0]
    ? { settings: { ...DEFAULT_BILLING_SETTINGS, ...rows[0].settings }, isDefault: false }
    : { settings: DEFAULT_BILLING_SETTINGS, isDefault: true };
}
