import { spawn, type ChildProcess } from 'node:child_process';
import { openSync, closeSync } from 'node:fs';
import { repoRoot } from './repo-paths';
import { ServiceError } from './service-error';

export interface ChildOptions {
  env?: NodeJS.ProcessEnv;
  /** Send the child's output to this file instead of our terminal. */
  logFile?: string;
  /**
   * Own process group: a terminal Ctrl-C then reaches only us, and we stop children and
   * services in order (server first, database last) instead of everything at once.
   */
  detached?: boolean;
}

export interface RunningChild {
  name: string;
  process: ChildProcess;
  /** Resolves with the exit code (null when ended by a signal). */
  exited: Promise<number | null>;
  isRunning(): boolean;
  stop(): Promise<void>;
}

const stopGraceMs = 10_000;

export function startChild(name: string, command: string, args: string[], options: ChildOptions = {}): RunningChild {
  const logFd = options.logFile ? openSync(options.logFile, 'a') : undefined;
  const child = spawn(command, args, {
    cwd: repoRoot,
    env: options.env ?? process.env,
    // no stdin: a detached child reading the terminal would be stopped by SIGTTIN
    stdio: logFd === undefined ? ['ignore', 'inherit', 'inherit'] : ['ignore', logFd, logFd],
    detached: options.detached ?? false,
  });
  if (logFd !== undefined) closeSync(logFd);
  let running = true;
  const exited = new Promise<number | null>((resolve) => {
    child.once('error', (error) => {
      running = false;
      console.error(`${name} could not start: ${error.message}`);
      resolve(1);
    });
    child.once('exit', (code) => {
      running = false;
      resolve(code);
    });
  });
  if (options.detached) {
    // backstop if we die without running our shutdown: a detached child would outlive us
    const killOnExit = () => running && child.kill('SIGKILL');
    process.once('exit', killOnExit);
    void exited.then(() => process.off('exit', killOnExit));
  }
  return {
    name,
    process: child,
    exited,
    isRunning: () => running,
    async stop() {
      if (!running) return;
      child.kill('SIGTERM');
      const timer = setTimeout(() => running && child.kill('SIGKILL'), stopGraceMs);
      await exited;
      clearTimeout(timer);
    },
  };
}

/** Runs a command to the end; a non-zero exit becomes a ServiceError with the given code. */
export async function runChild(
  name: string,
  command: string,
  args: string[],
  options: ChildOptions & { errorCode: string },
): Promise<void> {
  const code = await startChild(name, command, args, options).exited;
  if (code !== 0) {
    const where = options.logFile ? ` (output in ${options.logFile})` : '';
    throw new ServiceError(options.errorCode, `${name} failed with exit code ${code}${where}`);
  }
}

/** Polls GET url until it answers 2xx; fails early if the child dies. */
export async function waitForHealthy(url: string, child: RunningChild, timeoutMs = 60_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (!child.isRunning()) {
      throw new ServiceError('app.exited', `${child.name} exited (code ${await child.exited}) before ${url} answered`);
    }
    try {
      const response = await fetch(url, { signal: AbortSignal.timeout(2_000) });
      if (response.ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
  throw new ServiceError('app.not_healthy', `${url} did not answer within ${timeoutMs / 1000} s`);
}
