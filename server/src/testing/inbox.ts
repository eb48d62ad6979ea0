import { simpleParser, ParsedMail } from 'mailparser';
import { SMTPServer } from 'smtp-server';

export interface Inbox {
  readonly port: number;
  readonly messages: ParsedMail[];
  /** Resolves with the first message (already received or arriving) that matches; no sleeping. */
  waitFor(match: (m: ParsedMail) => boolean, timeoutMs?: number): Promise<ParsedMail>;
  close(): Promise<void>;
}

/** An in-process SMTP catcher the tests read. */
export async function startInbox(): Promise<Inbox> {
  const messages: ParsedMail[] = [];
  const waiters: Array<{ match: (m: ParsedMail) => boolean; resolve: (m: ParsedMail) => void }> = [];
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    logger: false,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then((mail) => {
          messages.push(mail);
          for (const w of [...waiters]) {
            if (w.match(mail)) {
              waiters.splice(waiters.indexOf(w), 1);
              w.resolve(mail);
            }
          }
          callback();
        })
        .catch(callback);
    },
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', () => resolve()));
  const port = (server.server.address() as { port: number }).port;
  return {
    port,
    messages,
    waitFor(match, timeoutMs = 15000) {
      const found = messages.find(match);
      if (found) return Promise.resolve(found);
      return new Promise((resolve, reject) => {
        const timer = setTimeout(() => reject(new Error('no matching e-mail arrived')), timeoutMs);
        waiters.push({ match, resolve: (m) => (clearTimeout(timer), resolve(m)) });
      });
    },
    close: () => new Promise((resolve) => server.close(() => resolve())),
  };
}

/** The first https?:// link in a message's text part. */
export function linkIn(mail: ParsedMail): string {
  const url = mail.text?.match(/https?:\/\/\S+/)?.[0];
  if (!url) throw new Error(`no link in e-mail "${mail.subject}"`);
  return url;
}
