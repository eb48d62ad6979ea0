import { execFileSync } from 'node:child_process';

/**
 * The text of a PDF, for tests. pdf-parse loads pdf.js through a dynamic import that jest's VM
 * refuses, so it runs in a plain Node child process and reads the PDF from stdin.
 */
export function pdfText(pdf: Buffer): string {
  const script = `
    const { PDFParse } = require('pdf-parse');
    const chunks = [];
    process.stdin.on('data', (c) => chunks.push(c));
    process.stdin.on('end', async () => {
      const parser = new PDFParse({ data: Buffer.concat(chunks) });
      const { text } = await parser.getText();
      await parser.destroy();
      process.stdout.write(text);
    });`;
  return execFileSync(process.execPath, ['-e', script], { input: pdf, cwd: __dirname, maxBuffer: 16 * 1024 * 1024 }).toString('utf8');
}
