import { expect } from '@playwright/test';
import { E2E } from './env';

interface CaughtMail {
  id: string;
  subject: string;
  to: Array<{ address: string }>;
  text: string;
  read?: boolean;
}

const mailApi = `http://127.0.0.1:${E2E.mailWebPort}/api/email`;

/**
 * Reads the mail catcher's API until an unread e-mail to `address` matching `subject` (and `text`,
 * when given) arrives, then marks it read. Journeys share one inbox per run, so a mail already
 * used by an earlier journey (a spent one-time link) is never picked up again.
 */
export async function waitForMail(address: string, subject: RegExp, options: { text?: string | RegExp } = {}): Promise<CaughtMail> {
  const wantsText = (mail: CaughtMail) =>
    options.text === undefined || (typeof options.text === 'string' ? mail.text.includes(options.text) : options.text.test(mail.text));
  let found: CaughtMail | undefined;
  await expect
    .poll(
      async () => {
        const res = await fetch(mailApi);
        const body = (await res.json()) as CaughtMail[] | { emails?: CaughtMail[]; data?: CaughtMail[] };
        const list = Array.isArray(body) ? body : (body.emails ?? body.data ?? []);
        found = list.find((m) => !m.read && m.to.some((t) => t.address === address) && subject.test(m.subject) && wantsText(m));
        return Boolean(found);
      },
      { timeout: 30_000, intervals: [250, 500, 1000] },
    )
    .toBe(true);
  // Opening one e-mail through the API marks it read.
  await fetch(`${mailApi}/${found!.id}`);
  return found!;
}

export function linkFrom(mail: CaughtMail): string {
  const url = mail.text.match(/https?:\/\/\S+/)?.[0];
  if (!url) throw new Error(`no link in "${mail.subject}"`);
  return url;
}

/** The e-mailed link as a path on the e2e server, so the browser stays on the page's origin. */
export function pathFrom(mail: CaughtMail): string {
  return linkFrom(mail).replace(E2E.baseUrl, '');
}
