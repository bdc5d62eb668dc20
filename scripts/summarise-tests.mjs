// Prints vitest's JSON report as the closing line CI reads, and exits non-zero on any failure
// (a failed beforeAll reports 0 failed tests but success: false).
import { readFileSync } from 'node:fs';

let report;
try {
  report = JSON.parse(readFileSync(process.argv[2], 'utf8'));
} catch {
  console.log('0 passed, 1 failed');
  process.exit(1);
}
const failed = report.numFailedTests + (report.success ? 0 : report.numFailedTests === 0 ? 1 : 0);
console.log(`${report.numPassedTests} passed, ${failed} failed`);
process.exit(report.success && report.numTotalTests > 0 ? 0 : 1);
