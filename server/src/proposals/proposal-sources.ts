import type { DepositCapSetting, EstimateStatus } from '@layerbook/contracts';
import type { TenantTx } from '@layerbook/db';
import type { Caution, LeadStatus } from '@layerbook/domain';
import { loadBillingSettings } from '../billing/settings';
import { conflict, notFound } from '../http/problem';

/** The parts of a saved estimate result a proposal reads (Decimals were stored as strings). */
export interface StoredVariant {
  readonly id: string;
  readonly label: string;
  readonly result: {
    readonly surfaces: ReadonlyArray<{
      roomId: string;
      surfaceId: string;
      name: string;
      finishSystemId: string;
      measure: { measure: 'area' | 'length'; quantity: number };
    }>;
    readonly schedule: {
      readonly days: ReadonlyArray<{ date: string }>;
      readonly milestones: ReadonlyArray<{ id: string; label: string; date: string }>;
      readonly finishDate: string;
      readonly workingDays: number;
    };
    readonly price: { price: string; tax: string; total: string };
    readonly options: ReadonlyArray<{ id: string; label: string; price: { price: string; tax: string; total: string } }>;
    readonly cautions: readonly Caution[];
    /** absent from results saved before the engine said it */
    readonly lead?: LeadStatus;
  };
}

export interface ProposalSources {
  readonly estimate: {
    id: string;
    title: string;
    status: string;
    startDate: string;
    variants: readonly StoredVariant[];
    /** the estimate's notes for the client (its internal notes are never read here) */
    clientNotes: string;
  };
  readonly firm: {
    name: string;
    addressLines: string[];
    phone: string;
    timeZone: string;
    currency: string;
    country: string;
    units: 'imperial' | 'metric';
  };
  readonly client: { id: string; name: string; email: string; phone: string };
  readonly site: { label: string; addressLines: string[]; yearBuilt: number | null };
  readonly roomNames: ReadonlyMap<string, { name: string; position: number }>;
  readonly finishNames: ReadonlyMap<string, string>;
  /** the deposit limit the firm chose in its billing settings */
  readonly depositCap: DepositCapSetting;
  /** that limit's name, as the firm wants it printed */
  readonly depositCapName: string;
}

/** The address columns firms and sites share. */
interface AddressColumns {
  address_line1: string;
  address_line2: string;
  city: string;
  region: string;
  postal_code: string;
}

interface EstimateRow {
  id: string;
  title: string;
  status: EstimateStatus;
  start_date: string;
  site_id: string;
  client_id: string;
  result: { variants?: StoredVariant[]; lengthUnit?: 'ft' | 'm' } | null;
  client_notes: string | null;
}

interface FirmRow extends AddressColumns {
  name: string;
  country: string;
  phone: string;
  time_zone: string;
  currency: string;
  units: 'imperial' | 'metric';
}

interface ClientRow {
  id: string;
  name: string;
  email: string;
  phone: string;
}

interface SiteRow extends AddressColumns {
  label: string;
  year_built: number | null;
}

/** A room or finish system: only its name is read. */
interface NamedRow {
  id: string;
  name: string;
}

const addressLines = (r: AddressColumns) =>
  [r.address_line1, r.address_line2, [r.city, [r.region, r.postal_code].filter(Boolean).join(' ')].filter(Boolean).join(', ')].filter(
    (l) => l.trim() !== '',
  );

/**
 * Everything a proposal is made from, read in the caller's transaction with the estimate row
 * locked, so version numbers are handed out one at a time. 409 when the estimate has no saved numbers.
 */
export async function loadProposalSources(tx: TenantTx, estimateId: string): Promise<ProposalSources> {
  const est: EstimateRow | undefined = (
    await tx.client.query<EstimateRow>(
      `select id, title, status, start_date::text as start_date, site_id, client_id, result, inputs->>'clientNotes' as client_notes
         from estimates where tenant_id = $1 and id = $2 for update`,
      [tx.tenantId, estimateId],
    )
  ).rows[0];
  if (!est) throw notFound('estimate');
  const variants = est.result?.variants ?? [];
  if (!variants.length)
    throw conflict('This estimate has no saved prices yet. Choose finishes and save the estimate first.', [
      { field: 'estimateId', message: 'Save the estimate with prices first.' },
    ]);

  const firm = (
    await tx.client.query<FirmRow>(
      `select name, address_line1, address_line2, city, region, postal_code, country, phone, time_zone, currency, units from firms where id = $1`,
      [tx.tenantId],
    )
  ).rows[0];
  // Sizes computed in feet are not square metres: a firm that changed its units since the save prices it again first.
  const firmUnit = firm.units === 'metric' ? 'm' : 'ft';
  if (est.result?.lengthUnit !== undefined && est.result.lengthUnit !== firmUnit)
    throw conflict(
      `This estimate was saved in ${est.result.lengthUnit === 'm' ? 'metres' : 'feet'} and the firm now measures in ${firmUnit === 'm' ? 'metres' : 'feet'}. Open the estimate and save it again first.`,
      [{ field: 'estimateId', message: 'Save the estimate again in the firm’s units.' }],
    );
  const client = (
    await tx.client.query<ClientRow>(`select id, name, email, phone from clients where tenant_id = $1 and id = $2`, [
      tx.tenantId,
      est.client_id,
    ])
  ).rows[0];
  const site = (
    await tx.client.query<SiteRow>(
      `select label, address_line1, address_line2, city, region, postal_code, year_built from sites where tenant_id = $1 and id = $2`,
      [tx.tenantId, est.site_id],
    )
  ).rows[0];
  const roomIds = [...new Set(variants.flatMap((v) => v.result.surfaces.map((s) => s.roomId)))];
  const systemIds = [...new Set(variants.flatMap((v) => v.result.surfaces.map((s) => s.finishSystemId)))];
  // Archived finish systems and rooms still name what was priced.
  const rooms = (
    await tx.client.query<NamedRow>(
      `select id, name from rooms where tenant_id = $1 and id = any($2::uuid[]) order by position, created_at, id`,
      [tx.tenantId, roomIds],
    )
  ).rows;
  const systems = (
    await tx.client.query<NamedRow>(`select id, name from finish_systems where tenant_id = $1 and id = any($2::uuid[])`, [
      tx.tenantId,
      systemIds,
    ])
  ).rows;
  const billing = await loadBillingSettings(tx);
  return {
    estimate: {
      id: est.id,
      title: est.title,
      status: est.status,
      startDate: est.start_date,
      variants,
      clientNotes: est.client_notes ?? '',
    },
    firm: {
      name: firm.name,
      addressLines: addressLines(firm),
      phone: firm.phone,
      timeZone: firm.time_zone,
      currency: firm.currency,
      country: firm.country,
      units: firm.units,
    },
    client: { id: client.id, name: client.name, email: client.email, phone: client.phone },
    site: { label: site.label, addressLines: addressLines(site), yearBuilt: site.year_built },
    roomNames: new Map(rooms.map((r, i) => [r.id, { name: r.name, position: i }])),
    finishNames: new Map(systems.map((s) => [s.id, s.name])),
    depositCap: billing.settings.depositCap,
    depositCapName: billing.settings.depositCapName,
  };
}
