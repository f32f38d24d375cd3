import next from 'eslint-config-next';

/**
 * The layers, enforced: each folder may import only what sits below it.
 *   lattice/ ← db/ ← lib/ ← components/ ← app/      (migrations/ import nothing of the app)
 * lattice/ is the engine and knows nothing of the app; db/ holds the queries and knows nothing
 * of the services; lib/ never reaches up into components; components/ never reach the database;
 * pages, actions and routes (app/) go through lib/'s services, never to db/ themselves, so a
 * figure on a screen is found in two hops: page → lib service → lattice.
 * Relative paths are caught as well as the `@/` alias.
 */
const layer = (files, forbidden, why) => ({
  files,
  rules: {
    'no-restricted-imports': [
      'error',
      {
        patterns: forbidden.map((dir) => ({
          group: [`@/${dir}`, `@/${dir}/*`, `../${dir}`, `../${dir}/*`, `../../${dir}`, `../../${dir}/*`, `../../../${dir}/*`],
          message: `${why} (eslint.config.mjs, the layers).`,
        })),
      },
    ],
  },
});

/** Queries live in db/queries/, handle-first; everything else calls them (one place to read every query). */
const queriesOnlyInDb = {
  files: ['lib/**', 'app/**', 'components/**', 'demo/**', 'scripts/**'],
  rules: {
    'no-restricted-syntax': [
      'error',
      {
        selector: 'CallExpression[callee.property.name=/^(selectFrom|insertInto|updateTable|deleteFrom|selectNoFrom)$/]',
        message: 'Write the query as a function in db/queries/ that takes the handle first, and call it (eslint.config.mjs).',
      },
      { selector: "TaggedTemplateExpression[tag.name='sql']", message: 'SQL lives in db/queries/ (eslint.config.mjs).' },
    ],
  },
};

const config = [
  { ignores: ['.next/**', 'node_modules/**', '.data/**', 'next-env.d.ts', 'types/leeway-api.d.ts'] },
  ...next,
  {
    rules: {
      '@typescript-eslint/no-explicit-any': 'off',
    },
  },
  layer(['lattice/**'], ['lib', 'db', 'components', 'app', 'demo'], 'The engine imports nothing of the app'),
  layer(['db/**'], ['lib', 'components', 'app', 'demo'], 'db/ imports nothing of the services or the pages: pass rules in from lib/'),
  layer(['migrations/**'], ['lib', 'db', 'components', 'app', 'demo', 'lattice'], 'A migration is frozen in time and imports nothing of the app'),
  layer(['lib/**'], ['components', 'app'], 'lib/ does not reach up into components/ or pages'),
  layer(['components/**'], ['db', 'app'], 'components/ never reach the database: take data from lib/ or props'),
  layer(['app/**'], ['db'], 'Pages, actions and routes call a service in lib/, which calls db/queries'),
  queriesOnlyInDb,
];

export default config;
