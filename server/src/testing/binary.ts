import { pdfText } from '../proposals/pdf/pdf-text';
import type { Agent } from './harness';

/** GET a file (a PDF, an image) as its bytes: supertest buffers text only unless told how. */
export const binary = (agent: Agent, url: string) =>
  agent
    .get(url)
    .buffer(true)
    .parse((r, done) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => done(null, Buffer.concat(chunks)));
    });

/** A PDF's text with its runs of white space as one space, to look for words in. */
export const pdfTextOf = (body: unknown) => pdfText(body as Buffer).replace(/\s+/g, ' ');
