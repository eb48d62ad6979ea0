import type { TenantTx } from '@layerbook/db';
import type { Actor } from '../http/actor';

export interface LineDraftRequest {
  readonly lineId: string;
  readonly origin: 'office' | 'queue';
  readonly actor: Actor;
  /** today in the firm's zone */
  readonly today: string;
  /** what met the trigger, in words, kept on the invoice ("Base coat finished on every surface on 2026-12-10") */
  readonly triggerText: string | null;
}

/**
 * Drafts the invoice for one billing-schedule line (deposit, stage or final), marking the line
 * ready. Idempotent: when the line already has a live invoice, returns it with `isNew` false.
 * OWNER: helper H2 (replaces this stub).
 */
export async function draftLineInvoice(_tx: TenantTx, _request: LineDraftRequest): Promise<{ invoiceId: string; isNew: boolean }> {
  throw new Error('draftLineInvoice: not built yet');
}
