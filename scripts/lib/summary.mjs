// Reads Vitest's JSON report to print one closing line for the whole run.
import { existsSync, readFileSync } from 'node:fs';

export function countsFromVitestJson(file) {
  if (!existsSync(file)) return null;
  const report = JSON.parse(readFileSync(file, 'utf8'));
  return {
    passed: report.numPassedTests ?? 0,
    failed: report.numFailedTests ?? 0,
    failedSuites: report.numFailedTestSuites ?? 0,
    skipped: (report.numPendingTests ?? 0) + (report.numTodoTests ?? 0),
  };
}
