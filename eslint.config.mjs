import nextCoreWebVitals from 'eslint-config-next/core-web-vitals';
import nextTypescript from 'eslint-config-next/typescript';

/*
 * The layers (DEVELOPERS.md, "Layers"): app → components → lib → models, never back.
 * A later block replaces an earlier one's no-restricted-imports for the files it
 * matches (flat config does not merge a rule's options), so each block below repeats
 * the restrictions of the layer it narrows.
 */
const upTo = (dirs) => `^(@/|(\\.\\./)+)(${dirs})(/|$)`;
const noAppOrComponents = {
  regex: upTo('app|components'),
  message: 'lib/ and models/ sit below app/ and components/: move the shared code down into lib/ instead.',
};
const noModels = {
  regex: upTo('models'),
  message: 'lib/validation is shared with the browser: take the words from lib/vocabulary.ts, not from a model.',
};
const engineOnly = [
  {
    regex: '^@/',
    message: 'The engine (lib/hydraulics) is self-contained: no @/ imports (the shared words are in ../vocabulary).',
  },
  {
    regex: '^\\.\\./(?!vocabulary$)',
    message: 'The engine (lib/hydraulics) imports nothing outside itself but ../vocabulary.',
  },
  {
    regex: '^(react|react-dom|next|next-auth|sequelize|swr)(/|$)',
    message: 'The engine (lib/hydraulics) imports no framework, React or database code.',
  },
];

const config = [
  ...nextCoreWebVitals,
  ...nextTypescript,
  {
    ignores: [
      '.next/**',
      'node_modules/**',
      '.data/**',
      'test-results/**',
      'playwright-report/**',
      'next-env.d.ts',
      'public/sw.js',
    ],
  },
  {
    files: ['lib/**/*.{ts,tsx}', 'models/**/*.{ts,tsx}'],
    rules: { 'no-restricted-imports': ['error', { patterns: [noAppOrComponents] }] },
  },
  {
    files: ['lib/validation/**/*.{ts,tsx}'],
    rules: { 'no-restricted-imports': ['error', { patterns: [noAppOrComponents, noModels] }] },
  },
  {
    files: ['lib/hydraulics/**/*.{ts,tsx}'],
    rules: { 'no-restricted-imports': ['error', { patterns: [noAppOrComponents, ...engineOnly] }] },
  },
];

export default config;
