/**
 * A small HTTPS client for the cluster check: one keep-alive connection pool to nginx, trusting the
 * run's self-signed certificate (not switching verification off), and a cookie jar the way a
 * browser keeps one for one site.
 */
import https from 'node:https';

export interface Answer {
  readonly status: number;
  readonly headers: Record<string, string | string[] | undefined>;
  readonly text: string;
  /** The web node nginx passed the request to (its X-Layerbook-Upstream header, host:port). */
  readonly upstream: string;
  json<T>(): T;
}

export class Browser {
  private readonly agent: https.Agent;
  private readonly jar = new Map<string, string>();
  /** The Set-Cookie lines as received, by cookie name (to show their attributes). */
  readonly setCookies = new Map<string, string>();

  constructor(
    private readonly base: URL,
    ca: Buffer,
  ) {
    this.agent = new https.Agent({ ca, keepAlive: true, maxSockets: 8 });
  }

  /** The Cookie header this browser sends now. */
  cookie(): string {
    return [...this.jar].map(([name, value]) => `${name}=${value}`).join('; ');
  }

  request(method: string, path: string, options: { body?: unknown; csrf?: string; cookie?: string } = {}): Promise<Answer> {
    const body = options.body === undefined ? undefined : JSON.stringify(options.body);
    const headers: Record<string, string> = { accept: 'application/json, text/html, text/csv' };
    const cookie = options.cookie ?? this.cookie();
    if (cookie) headers['cookie'] = cookie;
    if (body !== undefined) headers['content-type'] = 'application/json';
    if (options.csrf) headers['x-csrf-token'] = options.csrf;
    return new Promise((resolve, reject) => {
      const req = https.request(new URL(path, this.base), { method, headers, agent: this.agent }, (res) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('error', reject);
        res.on('end', () => {
          if (options.cookie === undefined) this.keep(res.headers['set-cookie'] ?? []);
          const text = Buffer.concat(chunks).toString('utf8');
          resolve({
            status: res.statusCode ?? 0,
            headers: res.headers,
            text,
            upstream: String(res.headers['x-layerbook-upstream'] ?? '?'),
            json: <T>() => JSON.parse(text) as T,
          });
        });
      });
      req.on('error', reject);
      req.end(body);
    });
  }

  close(): void {
    this.agent.destroy();
  }

  private keep(lines: string[]): void {
    for (const line of lines) {
      const [pair] = line.split(';');
      const at = pair.indexOf('=');
      const name = pair.slice(0, at).trim();
      const value = pair.slice(at + 1).trim();
      this.setCookies.set(name, line);
      // An expiry in the past (or an emptied value) is how a server deletes a cookie.
      const expires = /expires=([^;]+)/i.exec(line)?.[1];
      if (!value || (expires && Date.parse(expires) <= Date.now())) this.jar.delete(name);
      else this.jar.set(name, value);
    }
  }
}
