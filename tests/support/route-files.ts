/**
 * The API's route files on disk, read the way Next.js routes them: one entry per exported method
 * of each app/api/v1/…/route.ts, with its URL (each [param] kept as its name) and the text of its
 * export, for the tests that hold the route files to a table (the route matrix, the OpenAPI
 * operations).
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative, sep } from 'node:path';

export interface RouteExport {
  method: string;
  /** /api/v1/cases/[caseId]/submit */
  url: string;
  /** The source from `export const METHOD` to the next export or the end of the file. */
  text: string;
}

export function routeExports(root = join(process.cwd(), 'app', 'api', 'v1')): RouteExport[] {
  const found: RouteExport[] = [];
  const walk = (dir: string) => {
    for (const name of readdirSync(dir)) {
      const path = join(dir, name);
      if (statSync(path).isDirectory()) walk(path);
      else if (name === 'route.ts') {
        const url = ('/api/v1/' + relative(root, dir).split(sep).join('/')).replace(/\/$/, '');
        const source = readFileSync(path, 'utf8');
        const exports = [...source.matchAll(/export const (GET|POST|PATCH|PUT|DELETE)\b/g)];
        exports.forEach((m, k) => found.push({ method: m[1]!, url, text: source.slice(m.index, exports[k + 1]?.index ?? source.length) }));
      }
    }
  };
  walk(root);
  return found;
}
