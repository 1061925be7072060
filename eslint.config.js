// Lint rules for the whole tree: JavaScript's and TypeScript's recommended sets, Svelte's
// recommended set for components, and a few rules of our own (see DEVELOPERS.md, "Habits").
import js from '@eslint/js';
import ts from 'typescript-eslint';
import svelte from 'eslint-plugin-svelte';
import globals from 'globals';
import svelteConfig from './svelte.config.js';

export default ts.config(
  { ignores: ['node_modules/', 'dist/', 'test-output/', '.playwright-cache/', 'tmp-*/', 'static/'] },
  js.configs.recommended,
  ...ts.configs.recommended,
  ...svelte.configs.recommended,
  {
    languageOptions: { globals: { ...globals.browser, ...globals.node } },
  },
  {
    files: ['**/*.svelte', '**/*.svelte.ts'],
    languageOptions: { parserOptions: { parser: ts.parser, extraFileExtensions: ['.svelte'], svelteConfig } },
  },
  {
    rules: {
      '@typescript-eslint/no-explicit-any': 'error',
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      eqeqeq: ['error', 'always', { null: 'ignore' }],
      // Terminal, XML and import text is cleaned of control characters on purpose.
      'no-control-regex': 'off',
      // {' '} keeps a space between inline elements that the formatter would otherwise move.
      'svelte/no-useless-mustaches': 'off',
      // Maps built inside a $derived (or a cache that is deliberately not reactive) are not state.
      'svelte/prefer-svelte-reactivity': 'off',
    },
  },
);
