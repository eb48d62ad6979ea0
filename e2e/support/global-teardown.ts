import { existsSync, readFileSync, rmSync } from 'node:fs';
import path from 'node:path';
import { E2E } from './env';

/** Stops what global-setup started, by PID. */
export default function globalTeardown(): void {
  const dir = path.resolve(__dirname, '../..', E2E.stateDir);
  for (const name of ['server', 'maildev', 's3', 'stripe']) {
    const file = path.join(dir, `${name}.pid`);
    if (!existsSync(file)) continue;
    const pid = Number(readFileSync(file, 'utf8'));
    try {
      process.kill(-pid, 'SIGTERM');
    } catch {
      try {
        process.kill(pid, 'SIGTERM');
      } catch {
        /* already gone */
      }
    }
    rmSync(file);
  }
}
