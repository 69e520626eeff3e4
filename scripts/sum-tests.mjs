// Sums Vitest's and Playwright's JSON reports into one closing line: "N passed, N failed[, N skipped]".
// A missing report means that suite did not run: it counts as one failure, never as zero tests.
import { existsSync, readFileSync } from 'node:fs';

const args = process.argv.slice(2);
const quiet = args[0] === '--quiet';
const files = quiet ? args.slice(1) : args;
let passed = 0;
let failed = 0;
let skipped = 0;

for (const file of files) {
  if (!existsSync(file)) {
    if (!quiet) console.log(`${file}: no report (the suite did not run)`);
    failed += 1;
    continue;
  }
  /** @type {{ numPassedTests?: number, numFailedTests: number, numPendingTests: number, numTodoTests?: number, numFailedTestSuites: number, stats?: { expected: number, unexpected: number, flaky?: number, skipped: number }, errors?: unknown[] }} */
  const report = JSON.parse(readFileSync(file, 'utf8'));
  if (report.numPassedTests !== undefined) {
    // Vitest (Jest-compatible JSON)
    passed += report.numPassedTests;
    failed += report.numFailedTests;
    skipped += report.numPendingTests + (report.numTodoTests ?? 0);
    if (report.numFailedTestSuites > 0 && report.numFailedTests === 0) failed += report.numFailedTestSuites;
  } else if (report.stats) {
    // Playwright
    passed += report.stats.expected;
    failed += report.stats.unexpected + (report.stats.flaky ?? 0);
    skipped += report.stats.skipped;
    if ((report.errors ?? []).length > 0) failed += report.errors.length;
  }
}

if (!quiet) console.log();
console.log(`${passed} passed, ${failed} failed${skipped > 0 ? `, ${skipped} skipped` : ''}`);
process.exit(failed > 0 || passed === 0 ? 1 : 0);
