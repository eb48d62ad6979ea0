/** Stripe's error body: `{ error: { type, code?, message, param?, decline_code?, doc_url? } }`. */
export type StripeErrorType = 'api_error' | 'card_error' | 'idempotency_error' | 'invalid_request_error';

export interface StripeErrorBody {
  type: StripeErrorType;
  message: string;
  code?: string;
  param?: string;
  decline_code?: string;
  doc_url?: string;
  payment_intent?: unknown;
}

/** Thrown by a handler; the error middleware answers it in Stripe's shape with its HTTP status. */
export class StripeFakeError extends Error {
  constructor(
    readonly status: number,
    readonly body: StripeErrorBody,
  ) {
    super(body.message);
  }
}

const docUrl = (code: string) => `https://docs.stripe.com/error-codes/${code.replace(/_/g, '-')}`;

export const invalidRequest = (message: string, param?: string, code?: string) =>
  new StripeFakeError(400, {
    type: 'invalid_request_error',
    message,
    ...(param ? { param } : {}),
    ...(code ? { code, doc_url: docUrl(code) } : {}),
  });

export const missingParam = (param: string) => invalidRequest(`Missing required param: ${param}.`, param, 'parameter_missing');

export const unknownParam = (param: string) => invalidRequest(`Received unknown parameter: ${param}`, param, 'parameter_unknown');

export const resourceMissing = (kind: string, id: string, param = 'id') =>
  new StripeFakeError(404, {
    type: 'invalid_request_error',
    code: 'resource_missing',
    doc_url: docUrl('resource_missing'),
    message: `No such ${kind}: '${id}'`,
    param,
  });

export const authenticationFailed = (message: string) => new StripeFakeError(401, { type: 'invalid_request_error', message });

export const idempotencyError = (message: string) => new StripeFakeError(400, { type: 'idempotency_error', message });
