import type { FieldProblem, Problem } from '@layerbook/contracts';
import { dottedPath } from '@layerbook/domain';

/** The one typed error of the server. The error middleware turns it into problem+json. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly title: string,
    readonly detail?: string,
    readonly errors?: readonly FieldProblem[],
    /** a problem type the apps tell apart from others of this status (contracts' PROBLEM_TYPES); by status otherwise */
    readonly problemType?: string,
  ) {
    super(detail ?? title);
  }

  toProblem(requestId?: string): Problem {
    return {
      type: this.problemType ?? `https://layerbook.local/problems/${this.status}`,
      title: this.title,
      status: this.status,
      ...(this.detail ? { detail: this.detail } : {}),
      // one path style on the wire, whoever named the field (zod's dots, the engine's `lines[2].amount`)
      ...(this.errors?.length ? { errors: this.errors.map((e) => ({ ...e, field: dottedPath(e.field) })) } : {}),
      ...(requestId ? { requestId } : {}),
    };
  }
}

export const badRequest = (errors: readonly FieldProblem[], detail = 'Some fields need attention.') =>
  new HttpError(400, 'The request has invalid fields', detail, errors);
export const unauthorized = (detail = 'Sign in to continue.') => new HttpError(401, 'Not signed in', detail);
export const forbidden = (detail = 'Your role does not allow this.') => new HttpError(403, 'Not allowed', detail);
export const notFound = (what = 'record') => new HttpError(404, 'Not found', `No such ${what}.`);
export const conflict = (detail: string, errors?: readonly FieldProblem[]) => new HttpError(409, 'Conflict', detail, errors);
export const gone = (detail: string) => new HttpError(410, 'No longer valid', detail);
