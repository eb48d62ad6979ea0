import { HttpErrorResponse } from '@angular/common/http';
import type { Problem } from '@layerbook/contracts/types';
import { toProblem as serverProblem } from '../../../../../shared/errors/problem';
import { inPortalWords } from './problem-words';

/**
 * The portal's one reading of a failed call: the API's problem (projects/shared/errors/problem.ts)
 * in the portal's own words where a client can meet it (see problem-words.ts), as words keys that
 * `lbSay` / `lbFieldError` show in the client's language; otherwise the server's words.
 */
export function toProblem(error: unknown): Problem {
  return inPortalWords(serverProblem(error), error instanceof HttpErrorResponse ? error.url : null);
}

/** The one sentence to show for a failed call when no form field can carry it (a words key or the server's words). */
export function problemMessage(error: unknown): string {
  const problem = toProblem(error);
  return problem.detail ?? problem.title;
}

/**
 * For a call whose error a shared form reads itself (the e-mail-me-a-link form's Submission): the same
 * failure, its problem in the portal's words, so the form shows them too.
 */
export function inPortalWordsError(error: unknown): unknown {
  if (!(error instanceof HttpErrorResponse)) return error;
  return new HttpErrorResponse({
    error: toProblem(error),
    headers: error.headers,
    status: error.status,
    statusText: error.statusText,
    url: error.url ?? undefined,
  });
}
