import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';

export interface CaughtMail {
  readonly messageId: string;
  readonly to: string;
  readonly subject: string;
  readonly text: string;
}

/**
 * An SMTP catcher that can hold its answer: while held, a message's DATA is read in full but not
 * answered (no 250), so the sender's job is caught mid-send for as long as the test likes. A message
 * counts as delivered only once answered 250 on a connection still open (SMTP, RFC 5321 §4.1.1.4:
 * the receiver takes responsibility only with its reply).
 */
export interface MailCatcher {
  readonly port: number;
  /** messages answered 250, in order */
  readonly delivered: CaughtMail[];
  /** messages read but not yet answered (held) */
  pending(): number;
  hold(): void;
  /** answers every held message (on connections still open) and stops holding */
  release(): void;
  /** how many times each Message-ID was delivered */
  deliveriesById(): Map<string, number>;
  waitFor(match: (m: CaughtMail) => boolean, timeoutMs?: number): Promise<CaughtMail>;
  close(): Promise<void>;
}

export async function startMailCatcher(): Promise<MailCatcher> {
  const delivered: CaughtMail[] = [];
  const held: Array<{ sessionId: string; mail: CaughtMail; answer: () => void }> = [];
  const closedSessions = new Set<string>();
  let holding = false;
  const waiters: Array<{ match: (m: CaughtMail) => boolean; resolve: (m: CaughtMail) => void }> = [];
  const deliver = (mail: CaughtMail) => {
    delivered.push(mail);
    for (const w of [...waiters]) {
      if (w.match(mail)) {
        waiters.splice(waiters.indexOf(w), 1);
        w.resolve(mail);
      }
    }
  };
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    logger: false,
    onClose(session) {
      closedSessions.add(session.id);
    },
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          const to = Array.isArray(parsed.to) ? parsed.to.map((a) => a.text).join(', ') : (parsed.to?.text ?? '');
          const mail = { messageId: parsed.messageId ?? '', to, subject: parsed.subject ?? '', text: parsed.text ?? '' };
          const answer = () => {
            if (closedSessions.has(session.id)) return;
            deliver(mail);
            callback();
          };
          if (holding) held.push({ sessionId: session.id, mail, answer });
          else answer();
        })
        .catch((error: unknown) => callback(error instanceof Error ? error : new Error(String(error))));
    },
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', () => resolve()));
  const port = (server.server.address() as { port: number }).port;
  return {
    port,
    delivered,
    pending: () => held.filter((h) => !closedSessions.has(h.sessionId)).length,
    hold: () => void (holding = true),
    release() {
      holding = false;
      for (const h of held.splice(0)) h.answer();
    },
    deliveriesById() {
      const counts = new Map<string, number>();
      for (const m of delivered) counts.set(m.messageId, (counts.get(m.messageId) ?? 0) + 1);
      return counts;
    },
    waitFor(match, timeoutMs = 30_000) {
      const found = delivered.find(match);
      if (found) return Promise.resolve(found);
      return new Promise((resolve, reject) => {
        const timer = setTimeout(() => reject(new Error('no matching e-mail arrived')), timeoutMs);
        waiters.push({ match, resolve: (m) => (clearTimeout(timer), resolve(m)) });
      });
    },
    close: () => new Promise((resolve) => server.close(() => resolve())),
  };
}
