/**
 * Values every published-value check of the engine's tests (tests/lattice/reference/
 * published-checks.ts) with the engine as built, and writes .data/reference-results.json for the
 * validation report (lib/validation-report/). Run by scripts/build-engine-worker.sh at every
 * build, so the report always states what this engine gives, from the tests' own tables.
 */
import { mkdirSync, writeFileSync } from 'node:fs';
import { ENGINE_VERSION, valueProject } from '../lattice';
import { publishedChecks } from '../tests/lattice/reference/published-checks';
import { REFERENCE_RESULTS_FILE, type ReferenceResults } from '../lib/validation-report/reference-results';

const checks = publishedChecks.map((check) => {
  const engine = check.read(valueProject(check.model, { extras: false }));
  return {
    source: check.source,
    what: check.what,
    published: check.published,
    engine,
    tolerance: check.tolerance,
    passes: Math.abs(engine - check.published) <= check.tolerance,
  };
});
const results: ReferenceResults = { engineVersion: ENGINE_VERSION, generatedAt: new Date().toISOString(), checks };
mkdirSync('.data', { recursive: true });
writeFileSync(`.data/${REFERENCE_RESULTS_FILE}`, JSON.stringify(results, null, 1));
const failing = checks.filter((c) => !c.passes);
console.log(`› reference results: ${checks.length} published checks, ${failing.length} outside their tolerance`);
