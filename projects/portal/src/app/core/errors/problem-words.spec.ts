import { HttpErrorResponse } from '@angular/common/http';
import { TestBed } from '@angular/core/testing';
import { TranslateService } from '@ngx-translate/core';
import { PROBLEM_TYPES, type Problem } from '@layerbook/contracts/types';
import { describe, expect, it } from 'vitest';
import { toProblem as sharedToProblem } from '../../../../../shared/errors/problem';
import { sayIn } from '../../../../../shared/errors/say-pipe';
import commonEs from '../../../../../shared/i18n/words/common/es.json';
import { provideTestI18n } from '../../../../../shared/i18n/testing';
import authEs from '../../../i18n/auth/es.json';
import problemsEn from '../../../i18n/problems/en.json';
import problemsEs from '../../../i18n/problems/es.json';
import proposalsEs from '../../../i18n/proposals/es.json';
import { inPortalWordsError, problemMessage, toProblem } from './problem';
import { callOf, inPortalWords } from './problem-words';

/** The problem+json the server sends (server/src/http/problem.ts), as the client meets it. */
const answer = (status: number, detail: string, errors?: Problem['errors']): Problem => ({
  type: `https://layerbook.local/problems/${status}`,
  title: 'Server title',
  status,
  detail,
  ...(errors ? { errors } : {}),
});
const failed = (url: string, problem: Problem) =>
  new HttpErrorResponse({ url, status: problem.status, statusText: 'x', error: problem, headers: undefined });

describe('which call failed', () => {
  it.each([
    ['/api/portal/auth/redeem', 'signInLink'],
    ['http://127.0.0.1:4310/api/portal/proposals/p-1/accept', 'proposalAnswer'],
    ['/api/portal/proposals/p-1/decline', 'proposalDecline'],
    ['/api/portal/boards/b-1/request-changes', 'boardAnswer'],
    ['/api/portal/invoices/i-1/checkout?x=1', 'checkout'],
    ['/api/public/firms/ochre-lane/inquiries', 'inquiry'],
    ['/api/portal/proposals/p-1', null],
    [null, null],
  ])('%s is %s', (url, call) => {
    expect(callOf(url)).toBe(call);
  });
});

describe('problems in the portal’s words, by call, status and field', () => {
  it.each<[string, string, Problem, string]>([
    [
      'a spent sign-in link',
      '/api/portal/auth/redeem',
      answer(410, 'This sign-in link has expired. Ask for a new one.'),
      'auth.signInLink.expired',
    ],
    ['an unknown sign-in link', '/api/portal/auth/redeem', answer(404, 'No such sign-in link.'), 'auth.signInLink.unknown'],
    [
      'a link for an account the firm turned off',
      '/api/portal/auth/redeem',
      { ...answer(410, 'The firm has turned off this client account.'), type: PROBLEM_TYPES.portalAccessOff },
      'auth.signInLink.accessOff',
    ],
    [
      'a stale security token (signed in again in another tab)',
      '/api/portal/boards/b/approve',
      { ...answer(403, 'Reload the page and try again.'), type: PROBLEM_TYPES.csrf },
      'common.problems.securityCheck',
    ],
    ['too many link requests', '/api/portal/auth/link', answer(429, 'Too many attempts from this address.'), 'problems.tooMany'],
    [
      'too many inquiries',
      '/api/public/firms/a/inquiries',
      answer(429, 'Too many inquiries from this address.'),
      'problems.tooManyInquiries',
    ],
    [
      'a proposal already answered',
      '/api/portal/proposals/p/accept',
      answer(409, 'This proposal was already accepted.'),
      'problems.proposalDecided',
    ],
    [
      'a change order already answered',
      '/api/portal/change-orders/c/decision',
      answer(409, 'You already declined this change order.'),
      'problems.changeOrderDecided',
    ],
    [
      'a change order the job can no longer take',
      '/api/portal/change-orders/c/decision',
      answer(409, 'This deduction is larger than the work not yet started.', [
        { field: 'amount', message: 'This deduction is larger than the work not yet started.' },
      ]),
      'problems.changeOrderBlocked',
    ],
    [
      'a board already answered',
      '/api/portal/boards/b/approve',
      answer(409, 'You have already approved this board.'),
      'problems.boardDecided',
    ],
    [
      'below the processor’s minimum',
      '/api/portal/invoices/i/checkout',
      answer(409, 'Below the smallest card payment, 0.50 USD.', [{ field: 'amount', message: 'Below the smallest card payment.' }]),
      'problems.belowMinimum',
    ],
    ['an invoice already paid', '/api/portal/invoices/i/checkout', answer(409, 'Invoice INV-0004 is already paid.'), 'problems.notPayable'],
    [
      'the processor not answering',
      '/api/portal/invoices/i/checkout',
      answer(502, 'The card payment page could not be opened.'),
      'problems.processorDown',
    ],
    ['the server unavailable', '/api/portal/proposals', answer(503, 'Service unavailable'), 'problems.unavailable'],
    ['a server fault', '/api/portal/boards', answer(500, 'Internal error'), 'common.problems.serverSide'],
    ['a language not filed', '/api/portal/me/language', answer(409, 'Your firm has not filed your sign-in…'), 'problems.languageNotFiled'],
  ])('%s', (_name, url, problem, key) => {
    const said = inPortalWords(problem, url);
    expect([said.title, said.detail, said.status]).toEqual([key, key, problem.status]);
  });

  it('puts the form’s own words on each field it knows, and keeps the server’s on any other', () => {
    const said = inPortalWords(
      answer(400, 'Some fields need attention.', [
        { field: 'signedName', message: 'Type your full name to sign (at least 2 characters).' },
        { field: 'consent', message: 'Tick the box to confirm you accept this proposal.' },
        { field: 'somethingNew', message: 'A rule we have no words for.' },
      ]),
      '/api/portal/proposals/p/accept',
    );
    expect(said.title).toBe('problems.checkFields');
    expect(said.errors).toEqual([
      { field: 'signedName', message: 'proposals.acceptance.nameRequired' },
      { field: 'consent', message: 'proposals.acceptance.consentRequired' },
      { field: 'somethingNew', message: 'A rule we have no words for.' },
    ]);
  });

  it('keeps the server’s words for a problem it has none for', () => {
    const problem = answer(404, 'No such proposal.');
    expect(inPortalWords(problem, '/api/portal/proposals/p')).toEqual(problem);
    expect(inPortalWords(answer(409, 'Conflict'), '/api/portal/somewhere-new').detail).toBe('Conflict');
  });

  it('reads a failed HttpClient call, and one the shared form reads after the portal rethrows it', () => {
    const error = failed('/api/portal/auth/link', answer(429, 'Too many attempts from this address.'));
    expect(problemMessage(error)).toBe('problems.tooMany');
    expect(sharedToProblem(inPortalWordsError(error)).detail).toBe('problems.tooMany');
    expect(toProblem(new HttpErrorResponse({ status: 0, url: '/api/portal/proposals' })).title).toBe('common.problems.unreachable');
  });
});

describe('a Spanish reader', () => {
  it('reads the portal’s Spanish words, chosen without reading the server’s English', () => {
    TestBed.configureTestingModule({
      providers: [provideTestI18n({ problems: problemsEs, common: commonEs, auth: authEs, proposals: proposalsEs }, 'es')],
    });
    const translate = TestBed.inject(TranslateService);
    const say = (error: unknown) => sayIn(translate, problemMessage(error));
    expect(say(failed('/api/portal/auth/link', answer(429, 'Too many attempts')))).toBe(problemsEs.tooMany);
    expect(say(failed('/api/portal/proposals/p/decline', answer(409, 'You declined this proposal.')))).toBe(problemsEs.proposalDecided);
    expect(say(failed('/api/portal/auth/redeem', answer(410, 'This sign-in link was already used.')))).toBe(authEs.signInLink.expired);
    const staleToken = { ...answer(403, 'Reload the page and try again.'), type: PROBLEM_TYPES.csrf };
    expect(say(failed('/api/portal/change-orders/c/decision', staleToken))).toBe(commonEs.problems.securityCheck);
    const fields = toProblem(
      failed(
        '/api/portal/proposals/p/accept',
        answer(400, 'x', [{ field: 'consent', message: 'Tick the box to confirm you accept this proposal.' }]),
      ),
    ).errors!;
    expect(sayIn(translate, fields[0].message)).toBe(proposalsEs.acceptance.consentRequired);
    // Our English words say the same things (every key has both).
    expect(Object.keys(problemsEs).sort()).toEqual(Object.keys(problemsEn).sort());
  });
});
