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
  success: z.boolean(),
  testResults: z
    .array(z.object({ name: z.string(), status: z.string(), assertionResults: z.array(z.unknown()).default([]) }))
    .default([]),
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

// A test file that fails to load has no tests, so vitest counts it nowhere; it counts here as one failure.
function closingLine(results: z.infer<typeof resultsSchema>, filesNotRun: number): string {
  const skipped = results.numPendingTests + results.numTodoTests;
  const failed = results.numFailedTests + filesNotRun;
  return `${results.numPassedTests} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ''}`;
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
const filesNotRun = results.testResults.filter((file) => file.status === 'failed' && file.assertionResults.length === 0);
for (const file of filesNotRun) console.log(`could not run ${path.relative(repoRoot, file.name)}`);
console.log(`\n${closingLine(results, filesNotRun.length)}`);
const failed = exitCode !== 0 || results.numFailedTests > 0 || filesNotRun.length > 0 || !results.success;
process.exit(failed ? exitCode || 1 : 0);
