// Lint: TypeScript rules everywhere, plus the layering rule of the design card: the engine in
// src/ imports nothing from React, Konva, zustand or the DOM.
import js from '@eslint/js';
import globals from 'globals';
import tseslint from 'typescript-eslint';

const ENGINE_FORBIDDEN = {
  paths: [
    { name: 'react', message: 'src/ is the pure engine: no React.' },
    { name: 'react-dom', message: 'src/ is the pure engine: no React DOM.' },
    { name: 'konva', message: 'src/ is the pure engine: no Konva.' },
    { name: 'react-konva', message: 'src/ is the pure engine: no Konva.' },
    { name: 'zustand', message: 'src/ is the pure engine: state lives in app/.' },
  ],
  patterns: [
    { group: ['react/*', 'react-dom/*', 'konva/*', 'zustand/*'], message: 'src/ is the pure engine.' },
    { group: ['**/app/**', '../app', '../../app'], message: 'src/ must not import from app/.' },
  ],
};

// Node globals are refused too: the engine runs unchanged in a browser and in a worker.
const DOM_GLOBALS = ['process', 'Buffer', 'window', 'document', 'navigator', 'localStorage', 'sessionStorage', 'HTMLElement', 'HTMLCanvasElement', 'requestAnimationFrame', 'indexedDB', 'location'];

export default tseslint.config(
  { ignores: ['node_modules', 'dist', 'test-results', 'playwright-report', 'out'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      'no-constant-condition': ['error', { checkLoops: false }],
    },
  },
  {
    files: ['src/**/*.ts'],
    languageOptions: { globals: { ...globals.es2022 } },
    rules: {
      'no-restricted-imports': ['error', ENGINE_FORBIDDEN],
      'no-restricted-globals': ['error', ...DOM_GLOBALS.map((name) => ({ name, message: 'src/ is the pure engine: no DOM or Node globals.' }))],
    },
  },
);
