// `npm start`: the whole app on this machine, with local stand-ins for database, storage and mail.
import path from 'node:path';
import { startChild, waitForHealthy } from './services/child-process';
import { ensureClientBuild } from './services/client-build';
import { prepareLocalApp, printSignIns, timed, type PreparedApp } from './services/local-app';
import { tsxCli } from './services/repo-paths';
import { describeError } from './services/service-error';

async function runApp(app: PreparedApp): Promise<void> {
  await timed('client build', async () => {
    if (!(await ensureClientBuild({ env: app.env }))) console.log('  client build is current, skipped');
  });
  const server = startChild('server', process.execPath, [tsxCli, path.join('server', 'index.ts')], {
    env: app.env,
    detached: true,
  });
  app.children.push(server);
  app.stopWhenChildEnds(server);
  await timed('server', () => waitForHealthy(`http://127.0.0.1:${app.port}/api/health`, server));
}

const startedAt = performance.now();
let app: PreparedApp | undefined;
try {
  // not 'production': to the server that means behind an https proxy (secure cookies), and this is plain http
  app = await prepareLocalApp({ nodeEnv: 'development', appUrl: (port) => `http://127.0.0.1:${port}` });
  await runApp(app);
  console.log(`Ready in ${((performance.now() - startedAt) / 1000).toFixed(1)} s`);
  printSignIns(app.env.APP_URL ?? '', app.env.MAIL_INBOX_URL);
} catch (error) {
  console.error(describeError(error));
  if (app) await app.shutdown(1);
  process.exit(1);
}
