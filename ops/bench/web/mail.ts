/** An SMTP catcher on a port of the bench's own range: the client's e-mailed sign-in link arrives here. */
import { simpleParser, type ParsedMail } from 'mailparser';
import { SMTPServer } from 'smtp-server';

export interface Catcher {
  readonly port: number;
  /** The first message to `address` (already in or arriving within `timeoutMs`). */
  waitFor(address: string, timeoutMs: number): Promise<ParsedMail>;
  close(): Promise<void>;
}

const addressedTo = (mail: ParsedMail, address: string) =>
  (Array.isArray(mail.to) ? mail.to : mail.to ? [mail.to] : []).some((to) => to.value.some((v) => v.address === address));

export async function startCatcher(port: number): Promise<Catcher> {
  const messages: ParsedMail[] = [];
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    logger: false,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then((mail) => {
          messages.push(mail);
          callback();
        })
        .catch(callback);
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.server.once('error', reject);
    server.listen(port, '127.0.0.1', () => resolve());
  });
  return {
    port,
    async waitFor(address, timeoutMs) {
      const deadline = Date.now() + timeoutMs;
      for (;;) {
        const found = messages.find((m) => addressedTo(m, address));
        if (found) return found;
        if (Date.now() > deadline) throw new Error(`no e-mail to ${address} within ${timeoutMs / 1000} s`);
        await new Promise((r) => setTimeout(r, 200));
      }
    },
    close: () => new Promise((resolve) => server.close(() => resolve())),
  };
}

/** The first http(s) link in a message's text. */
export function firstLink(mail: ParsedMail): string {
  const url = mail.text?.match(/https?:\/\/\S+/)?.[0];
  if (!url) throw new Error(`no link in the e-mail "${mail.subject}"`);
  return url;
}
