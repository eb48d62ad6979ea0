import { HttpErrorResponse } from '@angular/common/http';
import type { FieldProblem, Problem } from '@layerbook/contracts/types';

/** Turns whatever an HTTP call threw into the API's problem shape, so callers handle one thing. */
export function toProblem(error: unknown): Problem {
  if (error instanceof HttpErrorResponse) {
    if (isProblem(error.error)) {
      return error.error;
    }
    if (error.status === 0) {
      return {
        type: 'about:blank',
        title: 'Layerbook could not be reached. Check your connection and try again.',
        status: 0,
      };
    }
    return { type: 'about:blank', title: fallbackTitle(error.status), status: error.status };
  }
  return { type: 'about:blank', title: 'Something went wrong. Please try again.', status: 0 };
}

/**
 * The one sentence to show for a failed call when no form field can carry it: the server's detail
 * when it gave one, otherwise its title (or ours, when the API was not reached or said nothing).
 */
export function problemMessage(error: unknown): string {
  const problem = toProblem(error);
  return problem.detail ?? problem.title;
}

function isProblem(body: unknown): body is Problem {
  return (
    typeof body === 'object' &&
    body !== null &&
    'title' in body &&
    typeof body.title === 'string' &&
    'status' in body &&
    typeof body.status === 'number' &&
    (!('errors' in body) || body.errors === undefined || isFieldProblemList(body.errors))
  );
}

function isFieldProblemList(value: unknown): value is FieldProblem[] {
  return (
    Array.isArray(value) &&
    value.every(
      (item: unknown) =>
        typeof item === 'object' &&
        item !== null &&
        'field' in item &&
        typeof item.field === 'string' &&
        'message' in item &&
        typeof item.message === 'string',
    )
  );
}

function fallbackTitle(status: number): string {
  if (status === 401) return 'Please sign in again.';
  if (status === 403) return 'Your role does not allow this.';
  if (status === 404) return 'We could not find that.';
  if (status === 429) return 'Too many tries. Wait a minute and try again.';
  if (status >= 500) return 'Something went wrong on our side. Please try again.';
  return 'Something went wrong. Please try again.';
}
