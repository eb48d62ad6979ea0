import type {
  DepositCapPresetId,
  ProposalSnapshot,
  ProposalTerms,
  SnapshotCaution,
  SnapshotOption,
  SnapshotRoom,
} from '@layerbook/contracts';
import {
  type CautionId,
  type DepositCapRule,
  jurisdictionLine,
  leadNotice,
  leadStatus,
  mergeCautions,
  minorUnitDigits,
  STANDING_LINE,
} from '@layerbook/domain';
import Decimal from 'decimal.js';
import { depositPresetOf } from '../billing/invoice-words';
import { optionPayments } from './payment-plan';
import type { ProposalSources, StoredVariant } from './proposal-sources';

export interface ProposalChoice {
  readonly issuedOn: string;
  readonly expiresOn: string;
  readonly terms: ProposalTerms;
  readonly exclusions: readonly string[];
  readonly notes: string;
  readonly depositCap: DepositCapRule;
}

const round1 = (n: number) => Math.round(n * 10) / 10;

/** The ready-made deposit rule's id beside its name, when the firm's rule is one. */
const withPresetId = (id: DepositCapPresetId | undefined) => (id ? { depositRuleId: id } : {});

/** Surfaces grouped by room in the site's order, each with the finish every option puts on it. */
function scopeByRoom(src: ProposalSources, unit: 'ft' | 'm'): SnapshotRoom[] {
  const variants = src.estimate.variants;
  const rooms = new Map<string, { id: string; name: string; position: number; surfaces: Map<string, SnapshotRoom['surfaces'][number]> }>();
  for (const v of variants) {
    for (const s of v.result.surfaces) {
      const known = src.roomNames.get(s.roomId);
      let room = rooms.get(s.roomId);
      if (!room)
        rooms.set(
          s.roomId,
          (room = { id: s.roomId, name: known?.name ?? 'Room', position: known?.position ?? Number.MAX_SAFE_INTEGER, surfaces: new Map() }),
        );
      if (room.surfaces.has(s.surfaceId)) continue;
      room.surfaces.set(s.surfaceId, {
        id: s.surfaceId,
        name: s.name,
        measure: s.measure.measure,
        quantity: round1(s.measure.quantity),
        unit: s.measure.measure === 'area' ? `${unit}²` : unit,
        finishes: variants.map((o) => {
          const on = o.result.surfaces.find((x) => x.surfaceId === s.surfaceId);
          return { optionId: o.id, finish: on ? (src.finishNames.get(on.finishSystemId) ?? 'Finish') : null };
        }),
      });
    }
  }
  return [...rooms.values()]
    .sort((a, b) => a.position - b.position)
    .map((r) => ({ id: r.id, name: r.name, surfaces: [...r.surfaces.values()] }));
}

/**
 * The engine's cautions across all options, once each, each line once, without the office's own
 * reminders; each says whose rule it is (a result saved before the engine said so gets it here).
 */
function safetyNotes(variants: readonly StoredVariant[], firmCountry: string): SnapshotCaution[] {
  return mergeCautions(
    variants.map((v) => v.result.cautions),
    'client',
  ).map((c) => ({ ...c, bullets: [...c.bullets], jurisdiction: c.jurisdiction ?? jurisdictionLine(c.id as CautionId, firmCountry) }));
}

function option(v: StoredVariant, currency: string, digits: number, choice: ProposalChoice): SnapshotOption {
  const money = (s: string) => new Decimal(s).toFixed(digits);
  const sched = v.result.schedule;
  const layerMilestones = sched.milestones
    .filter((m) => m.id.startsWith('layer:'))
    .map((m) => ({ layerId: m.id.slice('layer:'.length), label: m.label, date: m.date }));
  const total = money(v.result.price.total);
  const { payments, isDepositCapped } = optionPayments(
    total,
    currency,
    digits,
    choice.terms,
    { finishDate: sched.finishDate, layerMilestones },
    choice.depositCap,
  );
  return {
    id: v.id,
    label: v.label,
    price: money(v.result.price.price),
    tax: money(v.result.price.tax),
    total,
    schedule: {
      startDate: sched.days[0]?.date ?? sched.finishDate,
      finishDate: sched.finishDate,
      workingDays: sched.workingDays,
      milestones: sched.milestones.map((m) => ({ id: m.id, label: m.label, date: m.date })),
    },
    payments,
    isDepositCapped,
  };
}

/**
 * The self-contained document the client reads: no live ids are needed to show it, and the
 * version number is kept outside it so the same content always hashes the same.
 */
export function buildSnapshot(src: ProposalSources, choice: ProposalChoice): ProposalSnapshot {
  const currency = src.firm.currency;
  const digits = minorUnitDigits(currency);
  const lengthUnit = src.firm.units === 'metric' ? 'm' : 'ft';
  const first = src.estimate.variants[0];
  return {
    schemaVersion: 1,
    title: src.estimate.title,
    issuedOn: choice.issuedOn,
    expiresOn: choice.expiresOn,
    currency,
    locale: `en-${src.firm.country}`,
    lengthUnit,
    firm: { name: src.firm.name, addressLines: src.firm.addressLines, phone: src.firm.phone },
    client: { name: src.client.name, email: src.client.email, phone: src.client.phone },
    site: src.site,
    scope: scopeByRoom(src, lengthUnit),
    options: src.estimate.variants.map((v) => option(v, currency, digits, choice)),
    // Add-ons are priced from their own labour and materials, the same under every option.
    addOns: first.result.options.map((a) => ({
      id: a.id,
      label: a.label,
      price: new Decimal(a.price.price).toFixed(digits),
      tax: new Decimal(a.price.tax).toFixed(digits),
      total: new Decimal(a.price.total).toFixed(digits),
    })),
    exclusions: [...choice.exclusions],
    notes: choice.notes,
    terms: choice.terms,
    depositRule: src.depositCapName,
    ...withPresetId(depositPresetOf(src.depositCapName, src.depositCap.kind !== 'none')),
    safety: { standing: STANDING_LINE, cautions: safetyNotes(src.estimate.variants, src.firm.country) },
    // A pre-1978 home carries the notice whatever the options disturb; an unknown year does once paint is disturbed.
    leadNotice: leadNotice(
      leadStatus(
        src.site.yearBuilt,
        src.estimate.variants.some((v) => v.result.lead === 'assumed-target-housing'),
      ),
      src.firm.country,
    ),
  };
}
