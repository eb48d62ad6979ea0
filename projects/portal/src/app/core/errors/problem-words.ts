import { PROBLEM_TYPES, type FieldProblem, type Problem } from '@layerbook/contracts/types';

/**
 * The portal's own words for the problems a client can meet, by what was asked (the API path), the
 * answer's status and the field — never by the server's English, which may change. Each is a words
 * key (`lbSay` and `lbFieldError` show it in the reader's language); anything not listed keeps the
 * server's words, so nothing is lost.
 */

/** What a failed call was, read from its path; null for any other call. */
type Call =
  | 'signInLink'
  | 'linkRequest'
  | 'proposalAnswer'
  | 'proposalDecline'
  | 'boardAnswer'
  | 'changeOrderDecision'
  | 'checkout'
  | 'language'
  | 'inquiry';

const CALLS: ReadonlyArray<readonly [RegExp, Call]> = [
  [/^\/api\/portal\/auth\/redeem$/, 'signInLink'],
  [/^\/api\/portal\/auth\/link$/, 'linkRequest'],
  [/^\/api\/portal\/proposals\/[^/]+\/decline$/, 'proposalDecline'],
  [/^\/api\/portal\/proposals\/[^/]+\/(accept|request-changes)$/, 'proposalAnswer'],
  [/^\/api\/portal\/boards\/[^/]+\/(approve|request-changes)$/, 'boardAnswer'],
  [/^\/api\/portal\/change-orders\/[^/]+\/decision$/, 'changeOrderDecision'],
  [/^\/api\/portal\/invoices\/[^/]+\/checkout$/, 'checkout'],
  [/^\/api\/portal\/me\/language$/, 'language'],
  [/^\/api\/public\/firms\/[^/]+\/inquiries$/, 'inquiry'],
];

/** The call a URL names (absolute on the server render, relative in the browser; query ignored). */
export function callOf(url: string | null | undefined): Call | null {
  if (!url) return null;
  let path: string;
  try {
    path = new URL(url, 'http://portal.invalid').pathname;
  } catch {
    return null;
  }
  return CALLS.find(([pattern]) => pattern.test(path))?.[1] ?? null;
}

/** The sentence for the whole answer, or null to keep the server's. */
function sentenceFor(call: Call | null, problem: Problem): string | null {
  const { status } = problem;
  const hasField = (field: string) => (problem.errors ?? []).some((e) => e.field === field);
  if (status === 0) return 'common.problems.unreachable';
  if (status === 429) return call === 'inquiry' ? 'problems.tooManyInquiries' : 'problems.tooMany';
  if (status === 401) return 'common.problems.signInAgain';
  // a stale security token, left after the interceptor fetched a fresh one and tried once more
  if (status === 403 && problem.type === PROBLEM_TYPES.csrf) return 'common.problems.securityCheck';
  switch (call) {
    case 'signInLink':
      if (status === 410) return problem.type === PROBLEM_TYPES.portalAccessOff ? 'auth.signInLink.accessOff' : 'auth.signInLink.expired';
      if (status === 404) return 'auth.signInLink.unknown';
      if (status === 400) return 'auth.signInLink.incomplete';
      break;
    case 'proposalAnswer':
    case 'proposalDecline':
      if (status === 409) return 'problems.proposalDecided';
      break;
    case 'changeOrderDecision':
      if (status === 409) return hasField('amount') ? 'problems.changeOrderBlocked' : 'problems.changeOrderDecided';
      break;
    case 'boardAnswer':
      if (status === 409) return 'problems.boardDecided';
      break;
    case 'checkout':
      if (status === 409) return hasField('amount') ? 'problems.belowMinimum' : 'problems.notPayable';
      if (status === 502) return 'problems.processorDown';
      break;
    case 'language':
      if (status === 409) return 'problems.languageNotFiled';
      break;
    default:
      break;
  }
  if (status === 400 && (problem.errors?.length ?? 0) > 0) return 'problems.checkFields';
  if (status === 502 || status === 503 || status === 504) return 'problems.unavailable';
  if (status >= 500) return 'common.problems.serverSide';
  return null;
}

/** Each field a client's form may be refused on, by call: the words the form itself uses for it. */
const FIELD_WORDS: Readonly<Partial<Record<Call, Readonly<Record<string, string>>>>> = {
  linkRequest: { email: 'common.fieldErrors.emailInvalid' },
  proposalAnswer: {
    variantId: 'proposals.acceptance.chooseRequired',
    signedName: 'proposals.acceptance.nameRequired',
    consent: 'proposals.acceptance.consentRequired',
    comment: 'proposals.answers.changesRequired',
  },
  proposalDecline: { comment: 'problems.commentTooLong' },
  changeOrderDecision: {
    signedName: 'proposals.acceptance.nameRequired',
    consent: 'problems.changeOrderConsent',
    comment: 'problems.commentTooLong',
    amount: 'problems.changeOrderBlocked',
  },
  boardAnswer: { comment: 'samples.board.commentRequired' },
  checkout: { amount: 'problems.belowMinimum' },
  language: { language: 'problems.languageNotFiled' },
  inquiry: { email: 'common.fieldErrors.emailInvalid', startedAt: 'inquiry.page.expired' },
};

function fieldWords(call: Call | null, problem: Problem, sentence: string | null): FieldProblem[] | undefined {
  if (!problem.errors) return undefined;
  const words = call ? FIELD_WORDS[call] : undefined;
  return problem.errors.map((e) => {
    const key = words?.[e.field] ?? (e.field === '' && sentence ? sentence : undefined);
    return key ? { field: e.field, message: key } : e;
  });
}

/**
 * The problem in the portal's words: title and detail one key when the portal has words for this
 * call and status, each field's message the key its form uses; the rest as the server sent it.
 */
export function inPortalWords(problem: Problem, url: string | null | undefined): Problem {
  const call = callOf(url);
  const sentence = sentenceFor(call, problem);
  const errors = fieldWords(call, problem, sentence);
  return {
    ...problem,
    ...(sentence ? { title: sentence, detail: sentence } : {}),
    ...(errors ? { errors } : {}),
  };
}
