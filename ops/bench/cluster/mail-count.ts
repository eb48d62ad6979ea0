/** Counting the cluster's e-mail: deliveries in the run's mail catcher (maildev's REST API), sends in the workers' logs. */
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';

interface CaughtMail {
  readonly to?: ReadonlyArray<{ address: string }>;
  readonly time?: string;
}

export interface Deliveries {
  /** How many e-mails each address received. */
  readonly count: Map<string, number>;
  /** When the last of them arrived (ms since the epoch). */
  readonly lastAt: number;
}

async function deliveries(port: number, addresses: readonly string[]): Promise<Deliveries> {
  const res = await fetch(`http://127.0.0.1:${port}/api/email`);
  if (!res.ok) throw new Error(`mail catcher answered HTTP ${res.status}`);
  const wanted = new Set(addresses.map((a) => a.toLowerCase()));
  const count = new Map<string, number>();
  let lastAt = 0;
  for (const mail of (await res.json()) as CaughtMail[]) {
    for (const to of mail.to ?? []) {
      const address = to.address.toLowerCase();
      if (!wanted.has(address)) continue;
      count.set(address, (count.get(address) ?? 0) + 1);
      lastAt = Math.max(lastAt, Date.parse(mail.time ?? '') || 0);
    }
  }
  return { count, lastAt };
}

/** Waits (up to `timeoutMs`) until every address has received at least one e-mail; then the counts so far. */
export async function mailDeliveries(port: number, addresses: readonly string[], timeoutMs: number): Promise<Deliveries> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const found = await deliveries(port, addresses);
    if (addresses.every((a) => found.count.has(a.toLowerCase())) || Date.now() >= deadline) return found;
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
}

/** Lines logged as "mail sent" so far, per worker log (worker-1, worker-2 …) in the run's logs folder. */
export function workerSends(clusterDir: string): Record<string, number> {
  const logs = path.join(clusterDir, 'logs');
  const sends: Record<string, number> = {};
  for (const file of readdirSync(logs).filter((f) => /^worker-\d+\.log$/.test(f))) {
    const text = readFileSync(path.join(logs, file), 'utf8');
    sends[file.replace(/\.log$/, '')] = text.split('\n').filter((line) => line.includes('"msg":"mail sent"')).length;
  }
  return sends;
}
