import { isPlatformServer } from '@angular/common';
import { PLATFORM_ID, RESPONSE_INIT, TransferState, inject, makeStateKey } from '@angular/core';
import type { ResolveFn } from '@angular/router';
import { toProblem } from '../../core/errors/problem';
import type { PublicFirm } from '@layerbook/contracts/types';
import { InquiryApi } from './inquiry-api';

export type FirmLookup =
  | { readonly kind: 'found'; readonly firm: PublicFirm }
  | { readonly kind: 'missing' }
  | { readonly kind: 'failed'; readonly message: string };

/**
 * Looks the firm up by the slug in the address. The API marks its answer no-store (the form stamp
 * is fresh each time), so Angular's HTTP transfer cache skips it; the server-rendered answer is
 * handed to the browser here instead, so hydration shows the same firm and keeps the same stamp.
 */
export const firmLookupResolver: ResolveFn<FirmLookup> = (route) => resolveLookup(route.paramMap.get('slug') ?? '', true);

/** The thank-you page names the firm when it can, and is never itself an error page. */
export const firmNameResolver: ResolveFn<FirmLookup> = (route) => resolveLookup(route.paramMap.get('slug') ?? '', false);

async function resolveLookup(slug: string, isStatusOfPage: boolean): Promise<FirmLookup> {
  const state = inject(TransferState);
  const api = inject(InquiryApi);
  const isServer = isPlatformServer(inject(PLATFORM_ID));
  const response = inject(RESPONSE_INIT, { optional: true });
  const key = makeStateKey<FirmLookup>(`inquiry-firm:${slug}`);
  const handed = state.get(key, null);
  if (handed) {
    state.remove(key);
    return handed;
  }
  const lookup = await lookUp(api, slug);
  if (isServer) {
    state.set(key, lookup);
    if (response && isStatusOfPage && lookup.kind !== 'found') {
      response.status = lookup.kind === 'missing' ? 404 : 503;
    }
  }
  return lookup;
}

async function lookUp(api: InquiryApi, slug: string): Promise<FirmLookup> {
  try {
    return { kind: 'found', firm: await api.firm(slug) };
  } catch (error) {
    const problem = toProblem(error);
    if (problem.status === 404 || problem.status === 400) {
      return { kind: 'missing' };
    }
    return { kind: 'failed', message: 'inquiry.page.cannotOpen' };
  }
}
