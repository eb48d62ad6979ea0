/**
 * CPU time by party over a measured window, read from Linux's /proc by the driver's own thread:
 * the server (the bench process's main thread, where the app runs), the driver (the calling worker
 * thread), the process's other threads (V8's collector and compiler helpers, libuv's pool) and
 * PostgreSQL (every `postgres` process on the machine; a backend that ended meanwhile is counted
 * through the postmaster's times for its reaped children). Resolution is the kernel's clock tick
 * (10 ms), so a window should hold a few hundred requests. Null where there is no /proc.
 */
import { execFileSync } from 'node:child_process';
import fs from 'node:fs';

export interface CpuShare {
  server: number;
  driver: number;
  helpers: number;
  postgres: number;
}

interface Snapshot {
  server: number;
  driver: number;
  process: number;
  postgres: number;
}

let msPerTick: number | null = null;

/** utime + stime (and, with children, cutime + cstime) of one /proc stat file, in ticks. */
function ticks(file: string, children = false): number {
  const stat = fs.readFileSync(file, 'utf8');
  const fields = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
  const own = Number(fields[11]) + Number(fields[12]);
  return children ? own + Number(fields[13]) + Number(fields[14]) : own;
}

function postgresTicks(): number {
  let sum = 0;
  for (const pid of fs.readdirSync('/proc')) {
    if (!/^\d+$/.test(pid)) continue;
    try {
      if (fs.readFileSync(`/proc/${pid}/comm`, 'utf8').trim() === 'postgres') sum += ticks(`/proc/${pid}/stat`, true);
    } catch {
      // The process ended between the listing and the read: the postmaster's children's times have it.
    }
  }
  return sum;
}

/** Where each party stands now, or null without Linux's /proc. */
export function cpuSnapshot(): Snapshot | null {
  if (!fs.existsSync('/proc/thread-self/stat')) return null;
  msPerTick ??= 1000 / Number(execFileSync('getconf', ['CLK_TCK']).toString().trim());
  return {
    server: ticks(`/proc/self/task/${process.pid}/stat`),
    driver: ticks('/proc/thread-self/stat'),
    process: ticks('/proc/self/stat'),
    postgres: postgresTicks(),
  };
}

/** Each party's CPU milliseconds between two snapshots. */
export function cpuBetween(a: Snapshot | null, b: Snapshot | null): CpuShare | null {
  if (!a || !b || msPerTick === null) return null;
  const ms = (key: keyof Snapshot) => (b[key] - a[key]) * msPerTick!;
  return { server: ms('server'), driver: ms('driver'), helpers: ms('process') - ms('server') - ms('driver'), postgres: ms('postgres') };
}

/** Adds up the windows' shares (null if any is missing). */
export function addShares(shares: readonly (CpuShare | null | undefined)[]): CpuShare | null {
  if (shares.some((s) => !s)) return null;
  return shares.reduce<CpuShare>(
    (sum, s) => ({
      server: sum.server + s!.server,
      driver: sum.driver + s!.driver,
      helpers: sum.helpers + s!.helpers,
      postgres: sum.postgres + s!.postgres,
    }),
    { server: 0, driver: 0, helpers: 0, postgres: 0 },
  );
}

/** "server 500 + driver 280 + PostgreSQL 330 + helpers 20 = 1130" in µs per request (parties at 0 left out). */
export function perRequest(share: CpuShare | null, requests: number): string {
  if (!share) return 'n/a (no /proc)';
  const us = (ms: number) => Math.round((ms * 1000) / requests);
  const parts = (
    [
      ['server', share.server],
      ['driver', share.driver],
      ['PostgreSQL', share.postgres],
      ['helpers', share.helpers],
    ] as const
  ).filter(([, ms]) => us(ms) > 0);
  const total = share.server + share.driver + share.postgres + share.helpers;
  return `${parts.map(([name, ms]) => `${name} ${us(ms)}`).join(' + ')} = ${us(total)}`;
}
