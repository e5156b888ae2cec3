// Prints the one closing line `N passed, N failed[, N skipped]` over vitest's JSON report plus the
// set-up steps counted by test.sh, and exits non-zero when anything failed or vitest did not report.
import fs from 'node:fs'

const [file, extraPassed = '0', extraFailed = '0', vitestStatus = '0'] = process.argv.slice(2)
let passed = Number(extraPassed)
let failed = Number(extraFailed)
let skipped = 0
try {
  const report = JSON.parse(fs.readFileSync(file, 'utf8'))
  passed += report.numPassedTests
  failed += report.numFailedTests
  skipped += report.numPendingTests + report.numTodoTests
  // A file that fails to load (syntax error, failed import) has no test results but must count.
  failed += report.testResults.filter((r) => r.status === 'failed' && r.assertionResults.length === 0).length
} catch {
  failed += 1
  console.error(`[test] no vitest report at ${file}`)
}
if (Number(vitestStatus) !== 0 && failed === 0) failed = 1
console.log(`${passed} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ''}`)
process.exit(failed > 0 ? 1 : 0)
