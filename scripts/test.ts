// `npm test`: system packages, then every vitest project, then one plain closing line for CI.
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, readFileSync, rmSync, mkdirSync } from 'node:fs';
import path from 'node:path';
import { z } from 'zod';
import { repoRoot, storageRoot, vitestCli } from './services/repo-paths';

const resultsFile = path.join(storageRoot, 'test-results.json');

const resultsSchema = z.object({
  numPassedTests: z.number(),
  numFailedTests: z.number(),
  numPendingTests: z.number().default(0),
  numTodoTests: z.number().default(0),
  numFailedTestSuites: z.number().default(0),
  success: z.boolean(),
});

function ensureSystemPackages(): boolean {
  try {
    execFileSync('bash', [path.join(repoRoot, 'scripts', 'ensure-system-packages.sh'), 'all'], { stdio: 'inherit' });
    return true;
  } catch {
    return false;
  }
}

function runVitest(extraArgs: string[]): number {
  mkdirSync(storageRoot, { recursive: true });
  rmSync(resultsFile, { force: true }); // a stale file must not be read as this run's result
  const args = [vitestCli, 'run', '--reporter=default', '--reporter=json', `--outputFile.json=${resultsFile}`, ...extraArgs];
  const run = spawnSync(process.execPath, args, {
    cwd: repoRoot,
    stdio: 'inherit',
    env: { ...process.env, AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED: 'true' },
  });
  return run.status ?? 1;
}

function closingLine(results: z.infer<typeof resultsSchema>): string {
  const skipped = results.numPendingTests + results.numTodoTests;
  return `${results.numPassedTests} passed, ${results.numFailedTests} failed${skipped ? `, ${skipped} skipped` : ''}`;
}

if (!ensureSystemPackages()) {
  console.log('0 passed, 0 failed');
  process.exit(1);
}
const exitCode = runVitest(process.argv.slice(2));
const parsed = existsSync(resultsFile) ? resultsSchema.safeParse(JSON.parse(readFileSync(resultsFile, 'utf8'))) : undefined;
if (!parsed?.success) {
  console.log('\nvitest wrote no results (it failed before running tests)');
  console.log('0 passed, 0 failed');
  process.exit(exitCode || 1);
}
const results = parsed.data;
if (results.numFailedTestSuites > 0) console.log(`\n${results.numFailedTestSuites} test file(s) could not run`);
console.log(`\n${closingLine(results)}`);
process.exit(exitCode !== 0 || results.numFailedTests > 0 || !results.success ? exitCode || 1 : 0);
