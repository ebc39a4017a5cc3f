// `npm run dev`: local services, the server restarting on change, and vite's dev server with hot reload.
import path from 'node:path';
import { startChild, waitForHealthy } from './services/child-process';
import { prepareLocalApp, printSignIns, timed, type PreparedApp } from './services/local-app';
import { tsxCli, viteCli } from './services/repo-paths';
import { isPortTaken } from './services/free-port';
import { describeError, ServiceError } from './services/service-error';

// vite.config.ts listens on 5173; VITE_PORT moves it when a colleague's dev server holds that port
const vitePort = Number(process.env.VITE_PORT ?? 5173);

async function runApp(app: PreparedApp): Promise<void> {
  // tsx watch follows the server's own imports (server/, shared/), so client edits don't restart it
  const server = startChild('server', process.execPath, [tsxCli, 'watch', path.join('server', 'index.ts')], {
    env: app.env,
    detached: true,
  });
  // vite.config.ts reads PORT to proxy /api to this server
  const vite = startChild('vite', process.execPath, [viteCli, '--port', String(vitePort), '--strictPort'], {
    env: app.env,
    detached: true,
  });
  app.children.push(vite, server);
  app.stopWhenChildEnds(vite);
  app.stopWhenChildEnds(server);
  await timed('server', () => waitForHealthy(`http://127.0.0.1:${app.port}/api/health`, server));
}

let app: PreparedApp | undefined;
try {
  if (await isPortTaken(vitePort)) {
    throw new ServiceError('dev.port_taken', `port ${vitePort} for the vite dev server is already in use; stop that server or set VITE_PORT`);
  }
  app = await prepareLocalApp({ nodeEnv: 'development', appUrl: () => `http://127.0.0.1:${vitePort}` });
  await runApp(app);
  printSignIns(app.env.APP_URL ?? '', app.env.MAIL_INBOX_URL);
} catch (error) {
  console.error(describeError(error));
  if (app) await app.shutdown(1);
  process.exit(1);
}
