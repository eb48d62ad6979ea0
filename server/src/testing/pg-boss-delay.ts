/**
 * jest `setupFiles`: pg-boss's `delay` loads `node:timers/promises` on every call, and its worker
 * stop loop keeps calling it for a moment after the queue has stopped. Once jest has torn a test
 * file down that load fails ("Cannot destructure property 'setTimeout'"), and jest blames the next
 * file. The same delay, with the module loaded once here while the file is alive; pg-boss's manager
 * takes `delay` from this module object when it loads, after this runs.
 */
import { setTimeout as wait } from 'node:timers/promises';

interface Tools {
  delay: (ms: number, error?: string) => Promise<void> & { abort: () => void };
}

// eslint-disable-next-line @typescript-eslint/no-require-imports -- the same module object pg-boss's manager reads
const tools = require('pg-boss/src/tools') as Tools;

tools.delay = (ms, error) => {
  const ac = new AbortController();
  const promise = new Promise<void>((resolve, reject) => {
    wait(ms, null, { signal: ac.signal })
      .then(() => (error ? reject(new Error(error)) : resolve()))
      .catch(() => resolve());
  }) as Promise<void> & { abort: () => void };
  promise.abort = () => {
    if (!ac.signal.aborted) ac.abort();
  };
  return promise;
};
