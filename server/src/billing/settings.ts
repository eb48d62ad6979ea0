import {
  type BillingSettings,
  type BillingSettingsView,
  type BillingTerms,
  type DepositCapSetting,
  DEFAULT_BILLING_SETTINGS,
} from '@layerbook/contracts';
import type { SqlQuery, TenantTx } from '@layerbook/db';
import { type DepositCapRule, depositCap, minorUnitDigits } from '@layerbook/domain';
import Decimal from 'decimal.js';
import { recordAudit } from '../audit/record';
import type { Actor } from '../http/actor';
import { badRequest } from '../http/problem';
import { decimalsMessage, fitsCurrency } from './money';

/** The firm's stored billing settings ($1 tenant): no row until the owner saves them. */
export const BILLING_SETTINGS_SQL = `select settings from firm_billing_settings where tenant_id = $1`;

/** BILLING_SETTINGS_SQL for a batch of reads (readAllInOneTrip); billingSettingsOf makes the settings from its rows. */
export const billingSettingsRead = (tenantId: string): SqlQuery => ({
  name: 'firm_billing_settings',
  text: BILLING_SETTINGS_SQL,
  values: [tenantId],
});

/** The settings from BILLING_SETTINGS_SQL's rows: the stored ones over the defaults (newer fields), or the defaults. */
export function billingSettingsOf(rows: readonly { settings: BillingSettings }[]): { settings: BillingSettings; isDefault: boolean } {
  return rows[0]
    ? { settings: { ...DEFAULT_BILLING_SETTINGS, ...rows[0].settings }, isDefault: false }
    : { settings: DEFAULT_BILLING_SETTINGS, isDefault: true };
}

/** The firm's billing settings, or the defaults when the owner has not saved any. */
export async function loadBillingSettings(tx: TenantTx): Promise<{ settings: BillingSettings; isDefault: boolean }> {
  const { rows } = await tx.client.query<{ settings: BillingSettings }>(BILLING_SETTINGS_SQL, [tx.tenantId]);
  return billingSettingsOf(rows);
}

/** The settings' deposit limit as the domain takes it: whole percents become shares (10 → 0.1), in decimal. */
export function toDepositCapRule(cap: DepositCapSetting): DepositCapRule {
  switch (cap.kind) {
    case 'none':
      return { kind: 'none' };
    case 'amount':
      return { kind: 'amount', amount: cap.amount };
    case 'share':
      return { kind: 'share', share: new Decimal(cap.percent).div(100) };
    case 'lesserOf':
      return { kind: 'lesserOf', amount: cap.amount, share: new Decimal(cap.percent).div(100) };
  }
}

/** GET /api/firm/billing */
export async function getBillingSettings(tx: TenantTx): Promise<BillingSettingsView> {
  const { settings, isDefault } = await loadBillingSettings(tx);
  const { rows } = await tx.client.query<{ currency: string }>(`select currency from firms where id = $1`, [tx.tenantId]);
  return { settings, isDefault, currency: rows[0].currency };
}

/** The settings' money amounts with their field names (percents are not money). */
export function billingAmounts(settings: BillingSettings): Array<{ field: string; label: string; amount: string }> {
  const cap = settings.depositCap;
  return cap.kind === 'amount' || cap.kind === 'lesserOf'
    ? [{ field: 'depositCap.amount', label: 'The deposit limit', amount: cap.amount }]
    : [];
}

/** PUT /api/firm/billing: the owner's whole settings; running jobs keep the terms copied when their billing started. */
export async function saveBillingSettings(tx: TenantTx, actor: Actor, settings: BillingSettings, now: Date): Promise<BillingSettingsView> {
  // A deposit limit finer than the currency ("100000.50" yen) would be cut on every job. The firm's row
  // is share-locked so a currency change waits for this save and then checks what it stored.
  const { rows } = await tx.client.query<{ currency: string }>(`select currency from firms where id = $1 for share`, [tx.tenantId]);
  const currency = rows[0].currency;
  const tooFine = billingAmounts(settings).filter((a) => !fitsCurrency(a.amount, currency));
  if (tooFine.length) throw badRequest(tooFine.map((a) => ({ field: a.field, message: decimalsMessage(currency) })));
  await tx.client.query(
    `insert into firm_billing_settings (tenant_id, settings, updated_at) values ($1, $2, $3)
     on conflict (tenant_id) do update set settings = excluded.settings, updated_at = excluded.updated_at`,
    [tx.tenantId, JSON.stringify(settings), now],
  );
  // Deposit limits and terms decide what clients are asked to pay: every change is kept.
  await recordAudit(tx, {
    actorUserId: actor.userId,
    actorKind: actor.kind,
    action: 'firm.billing_settings_changed',
    entity: 'firm',
    entityId: tx.tenantId,
    data: { settings },
  });
  return getBillingSettings(tx);
}

/** The firm's settings as a job keeps them (BillingTerms): the deposit cap in money for this contract sum. */
export function billingTermsFor(settings: BillingSettings, contractSum: string, currency: string): BillingTerms {
  const cap = depositCap(toDepositCapRule(settings.depositCap), contractSum, currency);
  return {
    depositCapName: settings.depositCapName,
    depositCap: cap === null ? null : cap.toFixed(minorUnitDigits(currency)),
    terms: settings.terms,
    retainage: settings.retainage,
    depositCredit: settings.depositCredit,
  };
}
