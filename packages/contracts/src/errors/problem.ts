/**
 * The one error shape every Layerbook API answer uses (RFC 9457 problem details).
 * `errors` names each bad field so forms can show the message beside it.
 */
export interface FieldProblem {
  /** Dotted path of the field, e.g. `email` or `address.postalCode`. */
  readonly field: string;
  readonly message: string;
}

export interface Problem {
  readonly type: string;
  readonly title: string;
  readonly status: number;
  readonly detail?: string;
  readonly errors?: readonly FieldProblem[];
  readonly requestId?: string;
}

export const PROBLEM_CONTENT_TYPE = 'application/problem+json';
