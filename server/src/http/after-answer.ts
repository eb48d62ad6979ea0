import type { Response } from 'express';
import type { Logger } from 'pino';

/**
 * Runs `work` once the answer has gone out (the response's `finish`), so the time to answer does not
 * depend on it: an e-mail lookup that finds an account (token, outbox row) answers as fast as one that
 * finds none, and response times cannot tell which addresses have accounts. A failure is logged; the
 * person asks again.
 */
export function afterAnswer(res: Response, logger: Logger, what: string, work: () => Promise<unknown>): void {
  res.once('finish', () => {
    work().catch((error: unknown) => logger.error({ err: error }, `${what} failed after the answer`));
  });
}
