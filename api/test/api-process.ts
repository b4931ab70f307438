import { type ChildProcess, spawn, spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import http from 'node:http';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';

import { databaseEnvFor, type DatabaseProbe, dropDatabaseFor, openProbe } from './test-database.js';

const API_DIR = resolve(import.meta.dirname, '..');

/**
 * The built API (dist/) as its own process on a throwaway directory, as in production: started, killed with
 * SIGKILL and started again on the same database, photo and upload directories.
 */
export class ApiProcess {
  readonly env: NodeJS.ProcessEnv;
  /** 0 until the first start, when the API takes a free port and names it; kept across restarts after that. */
  port = 0;
  starts = 0;
  private child: ChildProcess | null = null;

  /** Given DATABASE_URL and DATABASE_PATH of another, a second process shares its database and files. */
  static async create(env: Record<string, string> = {}): Promise<ApiProcess> {
    const directory = mkdtempSync(join(tmpdir(), 'wiretrail-process-'));
    return new ApiProcess(directory, { ...(await databaseEnvFor(directory, 'wiretrail.sqlite')), ...env });
  }

  private constructor(readonly directory: string, env: Record<string, string>) {
    this.env = {
      ...process.env,
      NODE_ENV: 'production',
      HOST: '127.0.0.1',
      JWT_SECRET: 'process-test-secret-long-enough-for-signing-tokens',
      SIGN_IN_RATE_LIMIT: '1000',
      ...env,
    };
  }

  /** Its database, read behind its back. */
  probe(): Promise<DatabaseProbe> {
    return openProbe(this.env);
  }

  get running(): boolean {
    return this.child !== null;
  }

  /** Migrates and loads the demo data, as `npm start` does on an empty database. */
  prepare(): void {
    for (const script of ['dist/database/migrate-cli.js', 'dist/database/seed-cli.js']) {
      const r = spawnSync(process.execPath, [script], { cwd: API_DIR, env: this.env, encoding: 'utf8' });
      if (r.status !== 0) throw new Error(r.stderr);
    }
  }

  /**
   * The same, without blocking this process: for a store the API writes to that runs in this process (s3rver),
   * which must go on answering while the demo photos are loaded.
   */
  async prepareBeside(): Promise<void> {
    for (const script of ['dist/database/migrate-cli.js', 'dist/database/seed-cli.js']) {
      const child = spawn(process.execPath, [script], { cwd: API_DIR, env: this.env, stdio: ['ignore', 'ignore', 'pipe'] });
      let stderr = '';
      child.stderr!.on('data', (chunk: Buffer) => (stderr += chunk.toString()));
      const status = await new Promise<number | null>((done) => child.on('close', done));
      if (status !== 0) throw new Error(stderr);
    }
  }

  /** Where the API answers; uploads' addresses are relative to the origin. */
  get origin(): string {
    return `http://127.0.0.1:${this.port}`;
  }

  get base(): string {
    return `${this.origin}/api`;
  }

  /**
   * The first start takes a port the system gives the API itself, read from what it logs: a port probed free
   * beforehand can be taken by another test's process before the API binds it, and a health check there would
   * be answered by someone else. Restarts keep that port, so that a client's addresses stay good.
   */
  async start(): Promise<void> {
    const child = spawn(process.execPath, ['dist/main.js'], { cwd: API_DIR, env: { ...this.env, PORT: String(this.port) }, stdio: ['ignore', 'pipe', 'pipe'] });
    let stderr = '';
    let stdout = '';
    child.stderr!.on('data', (d: Buffer) => (stderr += d.toString()));
    child.stdout!.on('data', (d: Buffer) => {
      if (this.port === 0) stdout += d.toString();
    });
    this.child = child;
    this.starts++;
    // Up to a minute: on a machine shared with other test runs a start can take far longer than its usual second.
    for (const until = Date.now() + 60_000; Date.now() < until; ) {
      if (child.exitCode !== null) break;
      if (this.port === 0) {
        const named = /API listening on http:\/\/127\.0\.0\.1:(\d+)\/api/.exec(stdout);
        if (named) this.port = Number(named[1]);
        else {
          await new Promise((r) => setTimeout(r, 50));
          continue;
        }
      }
      try {
        if ((await this.request('GET', '/api/health')).status === 200) return;
      } catch {
        // not listening yet
      }
      await new Promise((r) => setTimeout(r, 50));
    }
    throw new Error(`the API did not start: ${stderr}`);
  }

  /**
   * One request (to a path as given, `/api/…` for the API) on a connection of its own: a pooled connection to a killed process would fail the next request
   * after a restart. Rejects when the connection drops, as a phone's request does.
   */
  request(method: string, path: string, options: { headers?: Record<string, string>; body?: Buffer | string | object } = {}): Promise<Answer> {
    const json = options.body !== undefined && !Buffer.isBuffer(options.body) && typeof options.body !== 'string';
    const body = json ? JSON.stringify(options.body) : (options.body as Buffer | string | undefined);
    const headers = { ...(json ? { 'content-type': 'application/json' } : {}), ...options.headers };
    return new Promise((resolve, reject) => {
      const req = http.request({ host: '127.0.0.1', port: this.port, method, path, headers, agent: false }, (res) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('error', reject);
        res.on('aborted', () => reject(new Error('the answer was cut off')));
        res.on('end', () => {
          const text = Buffer.concat(chunks).toString('utf8');
          const isJson = /json/.test(String(res.headers['content-type']));
          resolve({ status: res.statusCode!, headers: res.headers, text, body: isJson && text ? JSON.parse(text) : undefined });
        });
      });
      req.on('error', reject);
      req.end(body);
    });
  }

  /** SIGKILL: no shutdown hook runs, nothing is flushed, as when the machine loses power to the process. */
  kill(): Promise<void> {
    const child = this.child;
    this.child = null;
    if (!child || child.exitCode !== null) return Promise.resolve();
    return new Promise((r) => {
      child.once('exit', () => r());
      child.kill('SIGKILL');
    });
  }

  async remove(): Promise<void> {
    await this.kill();
    await dropDatabaseFor(this.directory);
    rmSync(this.directory, { recursive: true, force: true });
  }
}

export interface Answer {
  status: number;
  headers: http.IncomingHttpHeaders;
  text: string;
  /** The parsed JSON body, when the answer was JSON. */
  // eslint-disable-next-line @typescript-eslint/no-explicit-any -- each test reads the shape its own request answers
  body: any;
}

/** Signs in against a running process and returns the headers every later request carries. */
export async function signInTo(api: ApiProcess, email: string): Promise<{ headers: Record<string, string>; userId: string }> {
  const res = await api.request('POST', '/api/auth/sign-in', { body: { email, password: 'wiretrail-demo' } });
  if (res.status !== 200) throw new Error(`sign-in answered ${res.status}`);
  return { headers: { authorization: `Bearer ${res.body.accessToken}` }, userId: res.body.user.id };
}
