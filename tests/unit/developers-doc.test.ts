/**
 * DEVELOPERS.md's test table names every test file of its project (issue 16: the tables list
 * every subject), so a new test file fails here until a newcomer can find it there.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';

const doc = readFileSync(new URL('../../DEVELOPERS.md', import.meta.url), 'utf8');

describe('DEVELOPERS.md', () => {
  it.each(['lattice', 'unit', 'db', 'e2e'])('lists every %s test file in its row of the test table', (project) => {
    const row = doc.split('\n').find((line) => line.startsWith(`| \`${project}\``));
    expect(row, `no row for ${project}`).toBeDefined();
    const files = readdirSync(new URL(`../${project}/`, import.meta.url)).filter((f) => f.endsWith('.test.ts'));
    expect(files.length).toBeGreaterThan(0);
    const missing = files.map((f) => f.replace(/\.test\.ts$/, '')).filter((name) => !row!.includes(`\`${name}\``));
    expect(missing).toEqual([]);
  });
});
