/** What the streaming standby did while the check read the cash reports through nginx (read as the app role). */
import { Client } from 'pg';

const DB = 'layerbook_cluster';
const url = (port: number) => `postgres://layerbook_app:${process.env['LB_APP_PASSWORD'] ?? 'layerbook-app-local'}@127.0.0.1:${port}/${DB}`;

async function connect(port: number): Promise<Client> {
  const client = new Client({ connectionString: url(port), application_name: 'layerbook-cluster-check' });
  await client.connect();
  return client;
}

/** Is a standby (a server in recovery) listening on `port`? */
export async function standbyUp(port: number): Promise<boolean> {
  try {
    const client = await connect(port);
    try {
      return (await client.query<{ r: boolean }>('select pg_is_in_recovery() as r')).rows[0].r;
    } finally {
      await client.end();
    }
  } catch {
    return false;
  }
}

export interface StandbyFigures<T> {
  readonly reads: T[];
  readonly inRecovery: boolean;
  /** Transactions the web nodes' read pools ran on the standby while `reads` ran. */
  readonly standbyCommits: number;
  /** How far the standby's replay was behind the primary's WAL afterwards. */
  readonly lagBytes: number;
}

/**
 * Runs `reads` and counts the standby's committed transactions in this database meanwhile. PostgreSQL
 * publishes a backend's counts within about ten seconds of its last transaction (PostgreSQL
 * "The Cumulative Statistics System"), so the count is polled for that long; the check's own
 * queries are taken off.
 */
export async function readFromStandby<T>(
  ports: { primary: number; standby: number },
  reads: () => Promise<T[]>,
): Promise<StandbyFigures<T>> {
  const standby = await connect(ports.standby);
  const primary = await connect(ports.primary);
  try {
    let own = 0;
    const commits = async () => {
      own++;
      const { rows } = await standby.query<{ n: string }>(
        `select xact_commit as n from pg_stat_database where datname = current_database()`,
      );
      return Number(rows[0].n);
    };
    const before = await commits();
    const answers = await reads();
    let standbyCommits = 0;
    for (const deadline = Date.now() + 12_000; Date.now() < deadline; await new Promise((r) => setTimeout(r, 500))) {
      standbyCommits = (await commits()) - before - own + 1;
      if (standbyCommits >= answers.length) break;
    }
    const wal = (await primary.query<{ lsn: string }>('select pg_current_wal_lsn()::text as lsn')).rows[0].lsn;
    const { rows } = await standby.query<{ r: boolean; behind: string }>(
      `select pg_is_in_recovery() as r, greatest(0, pg_wal_lsn_diff($1::pg_lsn, pg_last_wal_replay_lsn())) as behind`,
      [wal],
    );
    return { reads: answers, inRecovery: rows[0].r, standbyCommits, lagBytes: Number(rows[0].behind) };
  } finally {
    await standby.end();
    await primary.end();
  }
}
