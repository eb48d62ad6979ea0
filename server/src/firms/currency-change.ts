import type { BillingSettings, ContainerInput, EstimatingSettings } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import { decimalsMessage, fitsCurrency } from '../billing/money';
import { billingAmounts, BILLING_SETTINGS_SQL } from '../billing/settings';
import { conflict } from '../http/problem';
import { estimatingAmounts } from './estimating';

/**
 * Whether the firm's currency may change from `from` to `to`: 409 naming `currency`, before anything
 * is written. The caller holds the firm's row `for update`; the saves of the amounts checked here
 * share-lock it, so none slips in between this check and the change.
 */
export async function checkCurrencyChange(tx: TenantTx, from: string, to: string): Promise<void> {
  await refuseCurrencyChangeOnceSold(tx, from);
  await refuseAmountsFinerThan(tx, to);
}

/**
 * The firm's money (its cash view, its reports) is kept in one currency: once a proposal has gone to a
 * client, a job was accepted, an invoice issued or a payment recorded, the currency stays (409 naming
 * it) — each of those carries the currency on into its job's invoices and payments, and the cash view
 * adds them up in the firm's. Before that — a firm setting up — it may change.
 */
async function refuseCurrencyChangeOnceSold(tx: TenantTx, currency: string): Promise<void> {
  const { rowCount } = await tx.client.query(
    `select 1 where exists (select 1 from proposal_versions where tenant_id = $1 and sent_at is not null)
                 or exists (select 1 from jobs where tenant_id = $1)
                 or exists (select 1 from invoices where tenant_id = $1 and status <> 'draft')
                 or exists (select 1 from payments where tenant_id = $1)`,
    [tx.tenantId],
  );
  if (!rowCount) return;
  const message = `Proposals, jobs and invoices are already in ${currency}: the firm's currency can no longer change.`;
  throw conflict(message, [{ field: 'currency', message }]);
}

interface StoredAmount {
  /** what and where, as the owner finds it: "The labour rate in the estimating settings" */
  readonly what: string;
  readonly amount: string;
}

/**
 * Stored amounts that their own save would refuse in the new currency (55.50 once the firm bills in
 * yen) would fail every estimate, deposit or price made from them. The owner changes the first one
 * named, then the currency; nothing is rounded quietly on their behalf.
 */
async function refuseAmountsFinerThan(tx: TenantTx, currency: string): Promise<void> {
  const tooFine = (await storedAmounts(tx)).find((a) => !fitsCurrency(a.amount, currency));
  if (!tooFine) return;
  const message = `${tooFine.what} is ${tooFine.amount}. ${decimalsMessage(currency)} Change it first, then the currency.`;
  throw conflict(message, [{ field: 'currency', message }]);
}

/** Every money amount the firm has stored for later use: settings first, then product prices by name. */
async function storedAmounts(tx: TenantTx): Promise<StoredAmount[]> {
  const estimating = await tx.client.query<{ settings: EstimatingSettings }>(
    `select settings from firm_estimating_settings where tenant_id = $1`,
    [tx.tenantId],
  );
  const billing = await tx.client.query<{ settings: BillingSettings }>(BILLING_SETTINGS_SQL, [tx.tenantId]);
  const products = await tx.client.query<{ name: string; is_archived: boolean; containers: ContainerInput[] }>(
    `select name, archived_at is not null as is_archived, containers from products where tenant_id = $1 order by name, id`,
    [tx.tenantId],
  );
  return [
    ...estimating.rows.flatMap((r) =>
      estimatingAmounts(r.settings).map((a) => ({ what: `${a.label} in the estimating settings`, amount: a.amount })),
    ),
    ...billing.rows.flatMap((r) =>
      billingAmounts(r.settings).map((a) => ({ what: `${a.label} in the billing settings`, amount: a.amount })),
    ),
    ...products.rows.flatMap((p) =>
      p.containers.map((c) => ({
        what: `The price of the ${c.label} container of "${p.name}"${p.is_archived ? ' (archived)' : ''} in the finish library`,
        amount: c.price,
      })),
    ),
  ];
}
