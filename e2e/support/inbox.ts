import { expect } from '@playwright/test';
import { E2E } from './env';

interface CaughtMail {
  subject: string;
  to: Array<{ address: string }>;
  text: string;
}

/** Reads the mail catcher's API until an e-mail to `address` matching `subject` arrives (no sleeping). */
export async function waitForMail(address: string, subject: RegExp): Promise<CaughtMail> {
  let found: CaughtMail | undefined;
  await expect
    .poll(
      async () => {
        const res = await fetch(`http://127.0.0.1:${E2E.mailWebPort}/api/email`);
        const body = (await res.json()) as CaughtMail[] | { emails?: CaughtMail[]; data?: CaughtMail[] };
        const list = Array.isArray(body) ? body : (body.emails ?? body.data ?? []);
        found = list.find((m) => m.to.some((t) => t.address === address) && subject.test(m.subject));
        return Boolean(found);
      },
      { timeout: 30_000, intervals: [250, 500, 1000] },
    )
    .toBe(true);
  return found!;
}

export function linkFrom(mail: CaughtMail): string {
  const url = mail.text.match(/https?:\/\/\S+/)?.[0];
  if (!url) throw new Error(`no link in "${mail.subject}"`);
  return url;
}
