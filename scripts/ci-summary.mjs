// Prints the closing line CI reads ("N passed, N failed, N skipped") from vitest's JSON report,
// and exits non-zero if anything failed or nothing ran.
import { readFileSync } from 'node:fs';

const report = JSON.parse(readFileSync(process.argv[2], 'utf8'));
const passed = report.numPassedTests;
const failed = report.numFailedTests;
const skipped = report.numPendingTests + report.numTodoTests;
console.log(`${report.testResults.length} test files`);
console.log(`${passed} passed, ${failed} failed, ${skipped} skipped`);
if (failed > 0 || passed === 0) process.exit(1);
