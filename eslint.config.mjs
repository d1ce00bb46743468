// ESLint (flat config): typescript-eslint's recommended rules, React's rules
// of hooks, and Next's own rules (core web vitals). `npm test` runs it before
// the type check, with no warnings allowed.
import nextPlugin from '@next/eslint-plugin-next';
import reactHooks from 'eslint-plugin-react-hooks';
import tseslint from 'typescript-eslint';

export default tseslint.config(
  { ignores: ['node_modules/', '.next/', '.next-*/', 'artifacts/', 'test-results/', 'data/', 'next-env.d.ts', 'db/migrations/'] },
  ...tseslint.configs.recommended,
  {
    files: ['**/*.{ts,tsx,mts,mjs}'],
    plugins: { 'react-hooks': reactHooks, '@next/next': nextPlugin },
    rules: {
      ...reactHooks.configs.recommended.rules,
      ...nextPlugin.configs.recommended.rules,
      ...nextPlugin.configs['core-web-vitals'].rules,
      // A hint for the React Compiler, which the app does not use: react-hook-form's
      // watch() and TanStack Table's hooks are fine without it.
      'react-hooks/incompatible-library': 'off',
      '@typescript-eslint/no-unused-vars': ['warn', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrors: 'none' }],
    },
  },
  {
    // Tests and scripts may use `any` for parsed JSON answers.
    files: ['tests/**', 'bench/**', 'scripts/**'],
    rules: { '@typescript-eslint/no-explicit-any': 'off' },
  },
);
