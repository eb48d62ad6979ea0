import type { TenantTx } from '@layerbook/db';
import { firmDateTime, firmTimeZone } from '../mail/firm-time';
import type { ClientPrincipal } from '../http/principal';
import { conflict } from '../http/problem';
import { clientWords, loadClientVersion, type ClientVersionRow } from './client-proposals';
import type { SignatureRecord } from './pdf/signature-section';

/**
 * The client's accepted version with its acceptance record, for the signed copy: the typed name,
 * the time in the firm's own zone, the chosen option, the IP and the fingerprint that was signed.
 * Another client's or firm's version is 404; a version not (yet) accepted has no signed copy (409).
 */
export async function loadSignedCopy(
  tx: TenantTx,
  client: ClientPrincipal,
  id: string,
): Promise<{ row: ClientVersionRow; signature: SignatureRecord }> {
  const row = await loadClientVersion(tx, client, id);
  if (row.status !== 'accepted' || !row.decided_at || !row.signed_name || !row.accepted_variant_id)
    throw conflict('There is a signed copy only once the proposal is accepted.');
  const { rows } = await tx.client.query<{ signed_ip: string | null }>(
    `select signed_ip from proposal_versions where tenant_id = $1 and id = $2`,
    [tx.tenantId, id],
  );
  return {
    row,
    signature: {
      signedName: row.signed_name,
      // In the reader's language, as the rest of their copy; the time in the firm's zone.
      signedAt: firmDateTime(row.decided_at, clientWords(client).locale, await firmTimeZone(tx, tx.tenantId)),
      optionId: row.accepted_variant_id,
      addOnIds: row.accepted_add_on_ids,
      ip: rows[0]?.signed_ip ?? '',
      snapshotHash: row.snapshot_hash,
    },
  };
}
