/**
 * The several-nodes check: against a running `bash ops/cluster/up.sh [--replica]`, through nginx only.
 *   npx tsx ops/bench/cluster/cluster-check.ts          (CLUSTER_CHECK_MAILS=20 e-mails by default)
 * Prints figures; exits 1 when a check fails:
 * - signs in as the demo owner over TLS, and shows the session cookie's attributes (Secure, __Host-);
 * - the same session works on both web nodes (which node answered: nginx's X-Layerbook-Upstream);
 * - N invitations queued through both nodes are each e-mailed exactly once by the two workers
 *   (counted in the run's mail catcher, and per worker from their logs);
 * - with the standby running, the cash figures and an export are read from it (its transactions counted);
 * - a sign-out through one node ends the session on every node, at once.
 * Figures, not a test (not in npm test): it needs the whole run up.
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import type { StaffSession, TeamInvitation } from '@layerbook/contracts';
import { Browser, type Answer } from './client';
import { mailDeliveries, workerSends } from './mail-count';
import { readFromStandby, standbyUp } from './standby-figures';

const ROOT = path.resolve(__dirname, '../../..');
const DIR = process.env['LB_CLUSTER_DIR'] ?? path.join(ROOT, '.data/cluster');
const PORTS = { https: 55440, mailWeb: 55426, primary: 55420, standby: 55421, web: [55431, 55432] } as const;
const MAILS = Number(process.env['CLUSTER_CHECK_MAILS'] ?? 20);
const OWNER = { email: 'owner@fernhollow.example', password: 'limewash-demo-2026' };

/** Which web node an nginx upstream address is (web-1, web-2 as up.sh names them). */
const nodeOf = (upstream: string) => {
  const i = PORTS.web.findIndex((p) => upstream.endsWith(`:${p}`));
  return i < 0 ? upstream : `web-${i + 1}`;
};
const tally = (answers: readonly Answer[]) => {
  const counts: Record<string, number> = {};
  for (const a of answers) counts[nodeOf(a.upstream)] = (counts[nodeOf(a.upstream)] ?? 0) + 1;
  return Object.entries(counts)
    .sort()
    .map(([node, n]) => `${node} ${n}`)
    .join(', ');
};

let failures = 0;
function check(ok: boolean, line: string): void {
  if (!ok) failures++;
  console.log(`${ok ? 'ok  ' : 'FAIL'} ${line}`);
}

async function main(): Promise<void> {
  const browser = new Browser(new URL(`https://localhost:${PORTS.https}`), readFileSync(path.join(DIR, 'tls/cert.pem')));
  try {
    const health = await browser.request('GET', '/api/health');
    check(health.status === 200, `nginx answers over TLS at https://localhost:${PORTS.https} (from ${nodeOf(health.upstream)})`);

    // Sign in: an anonymous CSRF token first, then the password; the answer sets the session cookie.
    const anonymous = (await browser.request('GET', '/api/auth/session')).json<StaffSession>();
    const signIn = await browser.request('POST', '/api/auth/signin', { body: OWNER, csrf: anonymous.csrfToken });
    check(signIn.status === 200, `signed in as ${OWNER.email} through ${nodeOf(signIn.upstream)} (HTTP ${signIn.status})`);
    const sessionCookie = [...browser.setCookies].find(([name]) => name.endsWith('lb.sid'));
    const attributes =
      sessionCookie?.[1]
        .split(';')
        .slice(1)
        .map((s) => s.trim().split('=')[0]) ?? [];
    check(
      !!sessionCookie && sessionCookie[0].startsWith('__Host-') && attributes.includes('Secure') && attributes.includes('HttpOnly'),
      `session cookie ${sessionCookie?.[0] ?? '(none)'}: ${attributes.join(', ')} (Secure set: the app trusts nginx's X-Forwarded-Proto)`,
    );

    // The same session on both nodes.
    const sessions = await Promise.all(Array.from({ length: 20 }, () => browser.request('GET', '/api/auth/session')));
    const firms = new Set(sessions.map((s) => s.json<StaffSession>().user?.firmName));
    check(
      firms.size === 1 && !firms.has(undefined) && new Set(sessions.map((s) => s.upstream)).size === PORTS.web.length,
      `20 session reads, signed in on every answer ("${[...firms].join('", "')}"): ${tally(sessions)}`,
    );
    const pages = await Promise.all(Array.from({ length: 4 }, () => browser.request('GET', '/today')));
    check(
      pages.every((p) => p.status === 200 && p.text.includes('<html')),
      `4 server-rendered pages (/today): ${tally(pages)}, HTTP ${pages.map((p) => p.status).join(' ')}`,
    );
    const csrf = (await browser.request('GET', '/api/auth/session')).json<StaffSession>().csrfToken;

    // Every queued e-mail goes out exactly once with two workers.
    const run = Date.now().toString(36);
    const emails = Array.from({ length: MAILS }, (_, i) => `cluster.${run}.${i + 1}@example.test`);
    const sendsBefore = workerSends(DIR);
    const queuedAt = Date.now();
    const invites = await Promise.all(
      emails.map((email) => browser.request('POST', '/api/team/invitations', { body: { email, role: 'crew' }, csrf })),
    );
    check(
      invites.every((r) => r.status === 201),
      `${MAILS} invitations queued (HTTP 201 each) through ${tally(invites)}`,
    );
    const delivered = await mailDeliveries(PORTS.mailWeb, emails, 60_000);
    const firstToLast = ((delivered.lastAt - queuedAt) / 1000).toFixed(1);
    // Another round through the queue: any duplicate of the first round would be in by then.
    const marker = `cluster.${run}.marker@example.test`;
    const markerInvite = await browser.request('POST', '/api/team/invitations', { body: { email: marker, role: 'crew' }, csrf });
    await mailDeliveries(PORTS.mailWeb, [marker], 30_000);
    const final = await mailDeliveries(PORTS.mailWeb, emails, 0);
    const counts = emails.map((e) => final.count.get(e) ?? 0);
    const sent = workerSends(DIR);
    const byWorker = Object.keys(sent)
      .sort()
      .map((w) => `${w} ${sent[w] - (sendsBefore[w] ?? 0)}`)
      .join(', ');
    check(
      counts.every((n) => n === 1),
      `${MAILS} e-mails delivered in ${firstToLast} s: exactly once ${counts.filter((n) => n === 1).length}, ` +
        `missing ${counts.filter((n) => n === 0).length}, twice or more ${counts.filter((n) => n > 1).length}; sent by ${byWorker} (the marker too)`,
    );
    for (const r of [...invites, markerInvite].filter((r) => r.status === 201)) {
      await browser.request('DELETE', `/api/team/invitations/${r.json<TeamInvitation>().id}`, { csrf });
    }

    if (await standbyUp(PORTS.standby)) {
      const figures = await readFromStandby(PORTS, async () => {
        const reads = await Promise.all([
          ...Array.from({ length: 10 }, () => browser.request('GET', '/api/cash/received')),
          browser.request('GET', '/api/cash/exports/payments.csv?from=2026-01-01&to=2026-12-31'),
          browser.request('GET', '/api/cash/exports/receivables.csv'),
        ]);
        return reads;
      });
      check(
        figures.reads.every((r) => r.status === 200),
        `12 cash reads (10 figures, 2 CSV exports) through ${tally(figures.reads)}: HTTP ${[...new Set(figures.reads.map((r) => r.status))].join(' ')}`,
      );
      check(
        figures.standbyCommits >= figures.reads.length,
        `the standby (127.0.0.1:${PORTS.standby}, in recovery: ${figures.inRecovery}) committed ${figures.standbyCommits} read transactions meanwhile; ` +
          `replay ${figures.lagBytes} bytes behind the primary`,
      );
    } else {
      console.log(`--   no standby on 127.0.0.1:${PORTS.standby} (ops/cluster/up.sh --replica shows the read replica)`);
    }

    // A sign-out through one node ends the session everywhere, though each node keeps a short copy of sessions it read.
    const oldCookie = browser.cookie();
    const signOut = await browser.request('POST', '/api/auth/signout', { csrf });
    const after = await Promise.all(
      Array.from({ length: 6 }, () => browser.request('GET', '/api/team/invitations', { cookie: oldCookie })),
    );
    check(
      signOut.status === 200 && after.every((r) => r.status === 401) && new Set(after.map((r) => r.upstream)).size === PORTS.web.length,
      `signed out through ${nodeOf(signOut.upstream)}; the old cookie then gets HTTP ${[...new Set(after.map((r) => r.status))].join(' ')} from ${tally(after)}`,
    );
  } finally {
    browser.close();
  }
  console.log(failures ? `\n${failures} check(s) failed.` : '\nEvery check passed.');
  process.exitCode = failures ? 1 : 0;
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
