import type { Express } from 'express';
import request from 'supertest';
import { createApp } from '../../../server/app';
import { parseConfig, type AppConfig } from '../../../server/config';
import { featureRouters } from '../../../server/features/feature-routers';
import { openRuntime, type Runtime } from '../../../server/runtime';

export type TestApp = { app: Express; runtime: Runtime; config: AppConfig; close(): Promise<void> };

// The real app on the run's real Postgres, fake S3 and fake SMTP (started by the api setup).
export async function createTestApp(overrides: Record<string, string> = {}, options: { workers?: boolean } = {}): Promise<TestApp> {
  const config = parseConfig({
    ...process.env,
    NODE_ENV: 'test',
    RATE_LIMIT_SIGN_IN: '1000',
    RATE_LIMIT_SIGN_UP: '1000',
    RATE_LIMIT_RESET: '1000',
    APP_URL: 'http://motifold.test',
    ...overrides,
  });
  const runtime = await openRuntime(config);
  // Loaded only when asked for, so tests without imports do not start the unpacker. With the
  // worker in process, uploads start unpacking while they are stored, as in `npm start`.
  const earlyUnpacks = options.workers ? await createEarlyUnpacksFor(config) : undefined;
  const app = createApp({ ...runtime, extraRouters: (shared) => featureRouters(runtime, shared, { earlyUnpacks }) });
  const stopWorkers = options.workers
    ? await (await import('../../../server/jobs/workers')).startImportWorkers(runtime, { earlyUnpacks })
    : async () => {};
  return {
    app,
    runtime,
    config,
    async close() {
      await stopWorkers();
      await earlyUnpacks?.close();
      await runtime.close();
    },
  };
}

async function createEarlyUnpacksFor(config: AppConfig) {
  const [{ createEarlyUnpacks }, { runUnpack }] = await Promise.all([
    import('../../../server/features/originals/early-unpacks'),
    import('../../../server/features/originals/unpack/run-unpack'),
  ]);
  return createEarlyUnpacks({ runUnpack, maxRunning: config.IMPORT_CONCURRENCY });
}

let counter = 0;
export const uniqueEmail = (label = 'user') => `${label}-${process.pid}-${Date.now().toString(36)}-${counter++}@saltmarsh.test`;

// A browser-like client: keeps its cookie, fetches and repeats the CSRF token.
export class ApiClient {
  readonly agent: ReturnType<typeof request.agent>;
  private token: string | null = null;

  constructor(app: Express) {
    this.agent = request.agent(app);
  }

  async csrf(): Promise<string> {
    const res = await this.agent.get('/api/auth/csrf').expect(200);
    this.token = res.body.csrfToken as string;
    return this.token;
  }

  get(path: string) {
    return this.agent.get(path);
  }

  async send(method: 'post' | 'patch' | 'put' | 'delete', path: string, body?: object) {
    const token = this.token ?? (await this.csrf());
    const req = this.agent[method](path).set('x-csrf-token', token);
    const res = await (body === undefined ? req : req.send(body));
    if (path.startsWith('/api/auth/sign-') || path.includes('/accept') || path.startsWith('/api/auth/password-reset/confirm')) this.token = null;
    return res;
  }

  post(path: string, body?: object) {
    return this.send('post', path, body);
  }
  patch(path: string, body?: object) {
    return this.send('patch', path, body);
  }
  delete(path: string) {
    return this.send('delete', path);
  }

  async upload(path: string, file: Buffer, fileName: string, fields: Record<string, string> = {}) {
    const token = this.token ?? (await this.csrf());
    let req = this.agent.post(path).set('x-csrf-token', token);
    for (const [k, v] of Object.entries(fields)) req = req.field(k, v);
    return req.attach('file', file, fileName);
  }
}

export async function signUpOwner(app: Express, studioName = 'Saltmarsh Studio') {
  const client = new ApiClient(app);
  const email = uniqueEmail('owner');
  const password = 'puffins-in-jumpers';
  const res = await client.post('/api/auth/sign-up', { name: 'Ines Okafor', email, password, studioName });
  if (res.status !== 201) throw new Error(`sign-up failed: ${res.status} ${JSON.stringify(res.body)}`);
  return { client, email, password, me: res.body as { user: { id: string }; studio: { id: string } } };
}

// Invites someone through the API, follows the mailed link and accepts it as a new account.
export async function addMember(app: Express, owner: ApiClient, role: 'editor' | 'reviewer', name = role === 'editor' ? 'Teodor Vance' : 'June Abara') {
  const email = uniqueEmail(role);
  const invite = await owner.post('/api/studio/invitations', { email, role });
  if (invite.status !== 201) throw new Error(`invite failed: ${invite.status} ${JSON.stringify(invite.body)}`);
  const { mailsTo, linkIn } = await import('./inbox');
  const [mail] = await mailsTo(email);
  const token = linkIn(mail, /\/invitations\/[A-Za-z0-9_-]+/).split('/').pop()!;
  const client = new ApiClient(app);
  const password = 'salt-and-spray-42';
  const accepted = await client.post(`/api/invitations/${token}/accept`, { name, password });
  if (accepted.status !== 200) throw new Error(`accept failed: ${accepted.status} ${JSON.stringify(accepted.body)}`);
  return { client, email, password, userId: accepted.body.user.id as string };
}
