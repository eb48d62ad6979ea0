import { assembleEstimateInput } from '@layerbook/contracts/engine';
import type { EstimateContext, EstimateInputs, Problem } from '@layerbook/contracts/types';
import type { EstimateInput } from '@layerbook/domain';
import type { EstimateForm } from './estimate-form';

/** Where a message belongs in the builder: beside one surface's finish, beside a field, or on top. */
export type FieldTarget = { kind: 'surface'; surfaceId: string } | { kind: 'control'; path: string } | { kind: 'top'; prefix: string };

/**
 * Turns a path the engine names (`rooms[0].surfaces[1].shape.rise` or `rooms.0.surfaces.1.shape.rise`, `pricing.discount.amount`,
 * `options[2].materialsCost`) into the builder's field for it, using the input it was given.
 */
export function engineTarget(path: string, input: EstimateInput): FieldTarget {
  // The browser's engine names `rooms[0]`; the server's problem+json says `rooms.0`: read both.
  const field = path.replace(/\.(\d+)(?=\.|$)/g, '[$1]');
  let m = /^rooms\[(\d+)\]\.surfaces\[(\d+)\]/.exec(field);
  if (m) {
    const surface = input.rooms[Number(m[1])]?.surfaces[Number(m[2])];
    if (surface) return { kind: 'surface', surfaceId: surface.id };
  }
  m = /^finishSystems\[(\d+)\]/.exec(field);
  if (m) return { kind: 'top', prefix: `Finish system “${input.finishSystems[Number(m[1])]?.name ?? '?'}” in the library: ` };
  m = /^products\[(\d+)\]/.exec(field);
  if (m) return { kind: 'top', prefix: `Product “${input.products[Number(m[1])]?.name ?? '?'}” in the library: ` };
  m = /^options\[(\d+)\]\.?(labourHours|materialsCost)?/.exec(field);
  if (m) return { kind: 'control', path: `addOns.${m[1]}.${m[2] ?? 'label'}` };
  m = /^pricing\.discount\.(amount|share)/.exec(field);
  if (m) return { kind: 'control', path: m[1] === 'amount' ? 'discount.amount' : 'discount.percent' };
  m = /^pricing\.direct\.(equipment|subcontracts|sundries)\[(\d+)\]/.exec(field);
  if (m) return { kind: 'control', path: `${m[1]}.${m[2]}.amount` };
  if (field === 'startDate') return { kind: 'control', path: 'startDate' };
  if (field.startsWith('settings.') || field.startsWith('pricing.')) return { kind: 'top', prefix: 'The firm’s estimating settings: ' };
  return { kind: 'top', prefix: '' };
}

export function targetKey(target: FieldTarget): string {
  return target.kind === 'surface' ? `surface:${target.surfaceId}` : target.kind === 'control' ? target.path : 'top';
}

/**
 * Puts each field error of a failed save beside its field (as the `server` error its mat-error
 * shows) and returns what is left for the top of the page. `sent` is what was saved: the server
 * numbers surfaces by their place in that option's list, not by id.
 */
export function applySaveProblem(form: EstimateForm, context: EstimateContext, sent: EstimateInputs, problem: Problem): string | null {
  const unplaced: string[] = [];
  for (const { field, message } of problem.errors ?? []) {
    const path = controlPath(field, context, sent);
    const control = path.kind === 'control' ? form.get(path.path) : null;
    if (control && control !== form) {
      control.setErrors({ ...control.errors, server: message });
      control.markAsTouched();
    } else {
      unplaced.push(`${path.kind === 'top' ? path.prefix : ''}${message}`);
    }
  }
  if (unplaced.length > 0) return unplaced.join(' ');
  return (problem.errors?.length ?? 0) > 0 ? null : (problem.detail ?? problem.title);
}

function controlPath(field: string, context: EstimateContext, sent: EstimateInputs): FieldTarget {
  const m = /^variants\.(\d+)\.(.*)$/.exec(field);
  if (!m) return { kind: 'control', path: field };
  const i = Number(m[1]);
  const rest = m[2];
  const variant = sent.variants[i];
  const listed = /^surfaces\.(\d+)\.(finishSystemId|surfaceId)$/.exec(rest);
  if (listed && variant) {
    const surfaceId = variant.surfaces[Number(listed[1])]?.surfaceId;
    if (surfaceId) return { kind: 'control', path: `variants.${i}.finishes.${surfaceId}` };
  }
  if (rest === 'label') return { kind: 'control', path: `variants.${i}.label` };
  if (rest === 'surfaces' || !variant) return { kind: 'top', prefix: variant ? `${variant.label}: ` : '' };
  const target = engineTarget(rest, assembleEstimateInput(context, sent, variant.id));
  if (target.kind === 'surface') return { kind: 'control', path: `variants.${i}.finishes.${target.surfaceId}` };
  if (target.kind === 'top') return { kind: 'top', prefix: `${variant.label}: ${target.prefix}` };
  return target;
}
