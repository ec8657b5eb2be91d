#!/usr/bin/env bash
# npm test: type-check, then every test; ends with the plain line "N passed, N failed".
set -uo pipefail
cd "$(dirname "$0")/.."
npx tsc --noEmit || { echo "typecheck failed"; echo "0 passed, 1 failed"; exit 1; }
mkdir -p test-results
NO_COLOR=1 npx vitest run --reporter=default --reporter=json --outputFile.json=test-results/vitest.json "$@"
code=$?
node -e '
  const fs = require("fs");
  const f = "test-results/vitest.json";
  if (!fs.existsSync(f)) { console.log("0 passed, 1 failed"); process.exit(0); }
  const r = JSON.parse(fs.readFileSync(f, "utf8"));
  // A test file that fails to load has no failed assertions but still fails: count it once.
  const brokenFiles = (r.testResults ?? []).filter((t) => t.status === "failed" && !(t.assertionResults ?? []).some((a) => a.status === "failed")).length;
  const skipped = (r.numPendingTests ?? 0) + (r.numTodoTests ?? 0);
  console.log(`${r.numPassedTests} passed, ${r.numFailedTests + brokenFiles} failed` + (skipped ? `, ${skipped} skipped` : ""));
'
exit $code
