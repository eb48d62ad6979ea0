import { isPlatformServer } from '@angular/common';
import { PLATFORM_ID, REQUEST_CONTEXT, RESPONSE_INIT, TransferState, inject, makeStateKey } from '@angular/core';
import type { FieldProblem } from '@layerbook/contracts/types';

/** A no-script post the API refused: what the prospect sent, and what was wrong with it. */
export interface PostedRefusal {
  readonly values: Readonly<Record<string, string>>;
  readonly errors: readonly FieldProblem[];
}

const REFUSAL_KEY = makeStateKey<PostedRefusal>('inquiry-refusal');

/**
 * On the server: the refusal the host put in the request context (`inquiryForm`, see server.ts);
 * the page then answers 400, and the refusal is handed on to the browser so the hydrated page
 * keeps showing the same messages.
 * In the browser: that hand-over, once. Null when the page was simply opened.
 * Must be called in an injection context.
 */
export function postedRefusal(): PostedRefusal | null {
  const state = inject(TransferState);
  if (isPlatformServer(inject(PLATFORM_ID))) {
    const context: unknown = inject(REQUEST_CONTEXT, { optional: true });
    const refusal = readRefusal(context);
    const response = inject(RESPONSE_INIT, { optional: true });
    if (refusal) {
      state.set(REFUSAL_KEY, refusal);
      if (response) {
        response.status = 400;
      }
    }
    return refusal;
  }
  const refusal = state.get(REFUSAL_KEY, null);
  state.remove(REFUSAL_KEY);
  return refusal;
}

/** The context comes from outside the app: take only well-formed strings from it. */
export function readRefusal(context: unknown): PostedRefusal | null {
  if (!isRecord(context) || !isRecord(context['inquiryForm'])) {
    return null;
  }
  const { values, errors } = context['inquiryForm'];
  const cleanValues: Record<string, string> = {};
  if (isRecord(values)) {
    for (const [name, value] of Object.entries(values)) {
      if (typeof value === 'string') {
        cleanValues[name] = value;
      }
    }
  }
  const cleanErrors = Array.isArray(errors)
    ? errors.filter(
        (item: unknown): item is FieldProblem => isRecord(item) && typeof item['field'] === 'string' && typeof item['message'] === 'string',
      )
    : [];
  return { values: cleanValues, errors: cleanErrors.map(({ field, message }) => ({ field, message })) };
}

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}
