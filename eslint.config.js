import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import vue from 'eslint-plugin-vue';
import prettier from 'eslint-config-prettier';

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
  // core/ is a pure library: no DOM, no Node, no Electron.
  {
    files: ['core/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            'node:*',
            'fs',
            'path',
            'electron',
            'vue',
            'chart.js',
            '../app/*',
            '../../app/*',
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
