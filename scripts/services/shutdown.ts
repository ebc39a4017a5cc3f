import { describeError } from './service-error';

/**
 * Runs `cleanup` once on Ctrl-C, SIGTERM or `shutdown()`, then exits. A second Ctrl-C exits at
 * once; a database left running is reused by the next start.
 */
export interface Shutdown {
  shutdown(exitCode: number): Promise<never>;
  isShuttingDown(): boolean;
}

export function onShutdown(cleanup: () => Promise<void>): Shutdown {
  let pending: Promise<never> | undefined;
  const shutdown = (exitCode: number): Promise<never> => {
    pending ??= (async () => {
      try {
        await cleanup();
      } catch (error) {
        console.error(describeError(error));
        exitCode = exitCode || 1;
      }
      process.exit(exitCode);
    })();
    return pending;
  };
  const onSignal = () => {
    if (pending) {
      console.error('\nStopping right away; a database left running is reused next time.');
      process.exit(130);
    }
    console.log('\nStopping…');
    void shutdown(0);
  };
  process.on('SIGINT', onSignal);
  process.on('SIGTERM', onSignal);
  return { shutdown, isShuttingDown: () => pending !== undefined };
}
