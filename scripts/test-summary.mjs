// Adds up the vitest JSON reports of every suite and prints "N passed, N failed".
import { readFileSync, existsSync } from 'node:fs';

let passed = 0;
let failed = 0;
let skipped = 0;
for (const file of process.argv.slice(2)) {
  if (!existsSync(file)) {
    console.log(`  (no report: ${file})`);
    continue;
  }
  const r = JSON.parse(readFileSync(file, 'utf8'));
  passed += r.numPassedTests ?? 0;
  failed += (r.numFailedTests ?? 0) + (r.numFailedTestSuites && !r.numFailedTests ? r.numFailedTestSuites : 0);
  skipped += (r.numPendingTests ?? 0) + (r.numTodoTests ?? 0);
}
console.log(`${passed} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ''}`);
process.exit(failed > 0 ? 1 : 0);
