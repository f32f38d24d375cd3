/**
 * `npm run -s value -- <model.json>` (or `-` for standard input): prints the valuation as JSON.
 * Bad input exits with status 2 and one line naming the field on standard error.
 */
import { readFileSync } from 'node:fs';
import { ModelError, valueProject } from './index';

function main(argv: string[]): number {
  const source = argv[0];
  if (!source || argv.length > 1) {
    process.stderr.write('usage: npm run -s value -- <model.json | ->\n');
    return 2;
  }
  let text: string;
  try {
    text = readFileSync(source === '-' ? 0 : source, 'utf8');
  } catch (error) {
    process.stderr.write(`cannot read ${source}: ${(error as Error).message}\n`);
    return 2;
  }
  let input: unknown;
  try {
    input = JSON.parse(text);
  } catch (error) {
    process.stderr.write(`model is not valid JSON: ${(error as Error).message}\n`);
    return 2;
  }
  try {
    process.stdout.write(`${JSON.stringify(valueProject(input), null, 2)}\n`);
    return 0;
  } catch (error) {
    if (error instanceof ModelError) {
      process.stderr.write(`${error.issues[0]!.message}\n`);
      return 2;
    }
    throw error;
  }
}

process.exitCode = main(process.argv.slice(2));
