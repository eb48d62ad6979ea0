/**
 * The kinds of work in the load run, each an autocannon request sequence on its own connections (32 in
 * all): the four lists the office reads, opening an estimate and saving it (the server prices it
 * again), a new proposal version, drafting an invoice from a schedule line and issuing it, and a
 * visitor opening the public form and sending it. Every write carries something unique (the form's
 * e-mail, the schedule line, the estimate's save count) so the database can be checked afterwards.
 */
import type autocannon from 'autocannon';
import type { Recorder, StepStats } from './stats';

type Request = autocannon.Request;
type Context = Record<string, unknown>;

export interface Session {
  readonly cookie: string;
  readonly csrf: string;
}

export interface LoadPlan {
  readonly owner: Session;
  readonly office: Session;
  readonly firmSlug: string;
  /** estimates made for the run (not accepted, so they can change), with the inputs they were saved with */
  readonly estimateIds: readonly string[];
  /** schedule lines ready to draft, spread so consecutive drafts fall on different jobs */
  readonly lines: ReadonlyArray<{ readonly jobId: string; readonly lineId: string }>;
  /** a proposal's expiry: a month after the run */
  readonly expiresOn: string;
}

export interface Kind {
  readonly name: string;
  readonly connections: number;
  readonly requests: Request[];
}

/** What a step asks for: method, path, body (JSON) and whose session; null to skip the rest of the sequence. */
interface Ask {
  readonly method: 'GET' | 'POST' | 'PUT';
  readonly path: string;
  readonly body?: unknown;
  readonly as?: Session;
}

const HEALTH: Ask = { method: 'GET', path: '/api/health' };

function toRequest(req: Request, ask: Ask): Request {
  const headers: Record<string, string> = {};
  if (ask.as) headers['cookie'] = ask.as.cookie;
  if (ask.method !== 'GET') {
    headers['content-type'] = 'application/json';
    if (ask.as) headers['x-csrf-token'] = ask.as.csrf;
  }
  return { ...req, method: ask.method, path: ask.path, headers, body: ask.body === undefined ? undefined : JSON.stringify(ask.body) };
}

/**
 * One measured step. The first step of a sequence, once the window has ended, asks /api/health instead
 * (not measured), so every sequence stops at its end; a later step whose ask is null skips the rest.
 */
function step(
  rec: Recorder,
  stats: StepStats,
  first: boolean,
  ask: (ctx: Context) => Ask | null,
  onOk?: (body: string, ctx: Context) => void,
): Request {
  return {
    setupRequest: (req, context) => {
      const ctx = context as Context;
      const wanted = first && rec.draining ? null : ask(ctx);
      ctx['measured'] = wanted !== null;
      if (wanted === null) return (first ? toRequest(req, HEALTH) : null) as Request;
      rec.sent(stats);
      return toRequest(req, wanted);
    },
    onResponse: (status, body, context) => {
      const ctx = context as Context;
      if (rec.answer(ctx['measured'] ? stats : null, status, body) && onOk) onOk(body, ctx);
    },
  };
}

export function loadKinds(rec: Recorder, plan: LoadPlan): Kind[] {
  let estimateTurn = 0;
  let versionTurn = 0;
  let nextLine = 0;
  let visitor = 0;
  const nextEstimate = () => plan.estimateIds[estimateTurn++ % plan.estimateIds.length];

  const list = (name: string, path: string, connections: number): Kind => {
    const s = rec.step(name, 'list');
    return { name, connections, requests: [step(rec, s, true, () => ({ method: 'GET', path, as: plan.office }))] };
  };

  const estimateOpen = rec.step('estimate', 'open');
  const estimateSave = rec.step('estimate', 'recompute + save');
  const version = rec.step('proposal', 'new version');
  const draft = rec.step('invoice', 'draft from line');
  const issue = rec.step('invoice', 'issue');
  const formOpen = rec.step('public form', 'open (stamp)');
  const formPost = rec.step('public form', 'send');

  return [
    list('inquiries', '/api/inquiries', 3),
    list('clients', '/api/clients', 3),
    list('jobs', '/api/jobs', 3),
    list('invoices', '/api/invoices', 3),
    {
      name: 'estimate',
      connections: 5,
      requests: [
        step(
          rec,
          estimateOpen,
          true,
          (ctx) => {
            ctx['estimateId'] = nextEstimate();
            return { method: 'GET', path: `/api/estimates/${ctx['estimateId'] as string}`, as: plan.owner };
          },
          (body, ctx) => {
            const view = JSON.parse(body) as { inputs: { title: string } };
            ctx['inputs'] = view.inputs;
          },
        ),
        step(
          rec,
          estimateSave,
          false,
          (ctx) => {
            const inputs = ctx['inputs'] as { title: string } | undefined;
            if (!inputs) return null;
            const title = `${inputs.title.replace(/ · save \d+$/, '')} · save ${estimateSave.sent + 1}`;
            return {
              method: 'PUT',
              path: `/api/estimates/${ctx['estimateId'] as string}/inputs`,
              body: { ...inputs, title },
              as: plan.owner,
            };
          },
          () => rec.estimateSaves++,
        ),
      ],
    },
    {
      name: 'proposal',
      connections: 2,
      requests: [
        step(
          rec,
          version,
          true,
          () => ({
            method: 'POST',
            path: '/api/proposals',
            body: { estimateId: plan.estimateIds[versionTurn++ % plan.estimateIds.length], expiresOn: plan.expiresOn },
            as: plan.owner,
          }),
          (body) => rec.proposalVersions.push((JSON.parse(body) as { id: string }).id),
        ),
      ],
    },
    {
      name: 'invoice',
      connections: 6,
      requests: [
        step(
          rec,
          draft,
          true,
          () => {
            const line = plan.lines[nextLine++];
            if (!line) {
              rec.linesRanOut++;
              return null; // a first step with nothing to ask sends /api/health, not measured
            }
            return {
              method: 'POST',
              path: `/api/jobs/${line.jobId}/invoices`,
              body: { kind: 'line', scheduleLineId: line.lineId },
              as: plan.office,
            };
          },
          (body, ctx) => {
            const id = (JSON.parse(body) as { id: string }).id;
            rec.drafts.push(id);
            ctx['invoiceId'] = id;
          },
        ),
        step(
          rec,
          issue,
          false,
          (ctx) =>
            typeof ctx['invoiceId'] === 'string'
              ? { method: 'POST', path: `/api/invoices/${ctx['invoiceId']}/issue`, body: { send: false }, as: plan.office }
              : null,
          (body) => {
            const issued = JSON.parse(body) as { id: string; number: string | null };
            rec.issued.set(issued.id, issued.number ?? '');
          },
        ),
      ],
    },
    {
      name: 'public form',
      connections: 7,
      requests: [
        step(
          rec,
          formOpen,
          true,
          () => ({ method: 'GET', path: `/api/public/firms/${plan.firmSlug}` }),
          (body, ctx) => {
            ctx['stamp'] = (JSON.parse(body) as { formStamp: string }).formStamp;
          },
        ),
        step(
          rec,
          formPost,
          false,
          (ctx) => {
            if (typeof ctx['stamp'] !== 'string') return null;
            const n = ++visitor;
            ctx['email'] = `visitor-${n}@load.example`;
            return { method: 'POST', path: `/api/public/firms/${plan.firmSlug}/inquiries`, body: visitorForm(n, ctx['stamp']) };
          },
          (_body, ctx) => rec.formEmails.push(ctx['email'] as string),
        ),
      ],
    },
  ];
}

/** An invented visitor's inquiry; the e-mail is unique to the request. */
function visitorForm(n: number, stamp: string) {
  return {
    name: `Visitor ${n}`,
    email: `visitor-${n}@load.example`,
    phone: '555-0100',
    siteAddress: `${n} Cobble Row, Ebbsfold`,
    yearBuilt: 1931,
    rooms: 'Entrance hall and stair: a soft limewash',
    finishIdea: 'Warm off-white, a little movement',
    timeline: 'In the spring',
    budgetRange: 'not_sure',
    heardFrom: 'search_or_social',
    referrerName: '',
    consent: true,
    website: '',
    startedAt: stamp,
  };
}
