// Adds up the vitest and Playwright JSON reports, plus typecheck/lint/build steps, into one closing line.
import { existsSync, readFileSync } from "node:fs";
import { join } from "node:path";

const dir = process.argv[2];
let passed = 0;
let failed = 0;
let skipped = 0;

for (const name of ["unit.json", "integration.json"]) {
  const file = join(dir, name);
  if (!existsSync(file)) continue;
  const r = JSON.parse(readFileSync(file, "utf8"));
  passed += r.numPassedTests ?? 0;
  const failedTests = r.numFailedTests ?? 0;
  // A file that fails to load has no failed test but a failed suite: count it too.
  failed += failedTests > 0 ? failedTests : (r.numFailedTestSuites ?? 0);
  skipped += (r.numPendingTests ?? 0) + (r.numTodoTests ?? 0);
}

const e2e = join(dir, "e2e.json");
if (existsSync(e2e)) {
  const s = JSON.parse(readFileSync(e2e, "utf8")).stats ?? {};
  passed += s.expected ?? 0;
  failed += (s.unexpected ?? 0) + (s.flaky ?? 0);
  skipped += s.skipped ?? 0;
}

// Steps that are not test runners (typecheck, lint, migrate, build) count as one check each.
const steps = existsSync(join(dir, "steps.txt")) ? readFileSync(join(dir, "steps.txt"), "utf8").trim().split("\n") : [];
for (const line of steps) {
  const [verdict, ...rest] = line.split(" ");
  const name = rest.join(" ");
  if (/tests$/.test(name)) {
    if (verdict === "fail" && !existsSync(join(dir, name.startsWith("unit") ? "unit.json" : name.startsWith("integration") ? "integration.json" : "e2e.json"))) failed += 1;
    continue;
  }
  if (verdict === "pass") passed += 1;
  else failed += 1;
}

process.stdout.write(`\n${passed} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ""}\n`);
process.exit(failed > 0 ? 1 : 0);
