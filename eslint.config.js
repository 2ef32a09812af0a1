import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import vue from 'eslint-plugin-vue';
import prettier from 'eslint-config-prettier';

// Spreading an array into a call passes every element as an argument: Math.max(...x) overflows
// the call stack at a few 10⁵ elements (docs/conventions.md §7). Use extent()/minOf()/maxOf() from core/data.
const NO_SPREAD_INTO_MATH_EXTREMES = {
  selector:
    "CallExpression[callee.object.name='Math'][callee.property.name=/^(max|min)$/] > SpreadElement",
  message:
    'No spread into Math.max/Math.min: it overflows the stack on big arrays. Use extent(), minOf() or maxOf() from core/data/extent.',
};

export default tseslint.config(
  { ignores: ['node_modules/', 'dist/', 'out/', 'release/', 'test-results/'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  ...vue.configs['flat/recommended'],
  {
    files: ['**/*.vue'],
    languageOptions: { parserOptions: { parser: tseslint.parser } },
  },
  {
    files: ['**/*.{js,mjs,ts,vue}'],
    languageOptions: {
      globals: {
        console: 'readonly',
        process: 'readonly',
        window: 'readonly',
        document: 'readonly',
      },
    },
    rules: {
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_' },
      ],
      '@typescript-eslint/no-explicit-any': 'error',
      // TypeScript (tsc, vue-tsc) already reports undefined names, with the right lib per folder;
      // typescript-eslint advises turning the core rule off.
      'no-undef': 'off',
    },
  },
  {
    files: ['core/**/*.ts', 'app/**/*.{ts,vue}', 'bench/**/*.ts', 'scripts/**/*.{ts,mjs}'],
    rules: {
      'no-restricted-syntax': ['error', NO_SPREAD_INTO_MATH_EXTREMES],
    },
  },
  // In the library and the renderer, arrays can hold a million points: no push(...array) either.
  {
    files: ['core/**/*.ts', 'app/renderer/**/*.{ts,vue}'],
    rules: {
      'no-restricted-syntax': [
        'error',
        NO_SPREAD_INTO_MATH_EXTREMES,
        {
          selector: "CallExpression[callee.property.name='push'] > SpreadElement",
          message:
            'No push(...array): it overflows the stack on big arrays. Push in a loop, or concatenate.',
        },
      ],
    },
  },
  // core/ is a pure library: no DOM, no Node, no Electron, nothing from app/ at any depth.
  {
    files: ['core/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              group: ['node:*', 'fs', 'fs/*', 'path', 'electron', 'electron/*', 'vue', 'chart.js'],
              message: 'core/ is pure: no Node, DOM, Electron or UI library.',
            },
            {
              regex: '^(\\.\\.?/)*(\\.\\./)+app(/|$)',
              message: 'core/ never imports app/.',
            },
            { regex: '^@core', message: 'Inside core/, import by relative path.' },
          ],
        },
      ],
    },
  },
  // The app reaches the library only through its public entry points (docs/architecture.md).
  {
    files: ['app/**/*.{ts,vue}'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              regex: '^(\\.\\.?/)*(\\.\\./)+core(/|$)',
              message: 'Import core through @core or @core/<folder> (its index.ts).',
            },
            {
              regex: '^@core/[^/]+/',
              message: 'Import core through @core or @core/<folder> (its index.ts), not deeper.',
            },
          ],
        },
      ],
    },
  },
  // Spreading a large array into Math.max/min overflows the call stack (10⁶ points): loop instead.
  {
    files: ['core/shift/**/*.ts', 'core/io/**/*.ts', 'core/pipeline/**/*.ts'],
    rules: {
      'no-restricted-syntax': [
        'error',
        {
          selector:
            "CallExpression[callee.object.name='Math'][callee.property.name=/^(max|min)$/] > SpreadElement",
          message:
            'Math.max/min(...array) overflows the call stack on large data sets: use a loop.',
        },
      ],
    },
  },
  prettier,
);
