import next from 'eslint-config-next';

const config = [
  { ignores: ['.next/**', 'node_modules/**', '.data/**', 'next-env.d.ts', 'types/leeway-api.d.ts'] },
  ...next,
  {
    rules: {
      '@typescript-eslint/no-explicit-any': 'off',
    },
  },
];

export default config;
