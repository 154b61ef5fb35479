// The rules that keep Tenuis's shape (DEVELOPERS.md, "Layers"): no import cycles anywhere, the engine's folders
// stacked in one order, the engine free of app/, workers/ and cli/, and the page reaching the engine only through
// app/bridge/ (everything else in app/ imports engine and worker modules as types). `npm run lint` runs it; `npm test`
// runs `npm run lint` before the unit tests, so a broken rule fails the build early.
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import { importX } from 'eslint-plugin-import-x';
import { createTypeScriptImportResolver } from 'eslint-import-resolver-typescript';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

/**
 * The engine's layers, lowest first: a folder may import from its own layer and the layers before it, never from a
 * later one. Folders on one line are one layer and must not import each other.
 */
export const ENGINE_LAYERS = [
  ['physics', 'particles'],
  ['units'],
  ['gas'],
  ['case'],
  ['geometry'],
  ['plan'],
  ['kernel'],
  ['stats'],
  ['results'],
  ['run'],
  ['io'],
  ['continuum'],
  ['longDuct'],
  ['sizing'],
  ['report'],
];

/** One zone per (layer, later layer) pair, and one per pair of folders within a layer. */
function engineLayerZones() {
  const zones = [];
  ENGINE_LAYERS.forEach((layer, i) => {
    const later = ENGINE_LAYERS.slice(i + 1).flat();
    for (const folder of layer) {
      for (const other of later) {
        zones.push({
          target: `./engine/${folder}`,
          from: `./engine/${other}`,
          message: `engine/${folder} sits below engine/${other} in the layer order (eslint.config.js, ENGINE_LAYERS)`,
        });
      }
      for (const sibling of layer) {
        if (sibling === folder) continue;
        zones.push({
          target: `./engine/${folder}`,
          from: `./engine/${sibling}`,
          message: `engine/${folder} and engine/${sibling} are one layer and must not import each other`,
        });
      }
    }
  });
  return zones;
}

/**
 * Modules of app/ that run behind a dynamic import (their own chunks) and so may import engine and worker code: the
 * two chunks app/bridge/loadEngine.ts loads, each its entry module and what only it imports. The rest of app/bridge/
 * (loadEngine.ts itself and the APIs' interfaces in types.ts) is in the main bundle and is checked like all of app/.
 */
export const APP_BRIDGE = [
  // The set-up chunk (loadSetupApi).
  'app/bridge/setupApi.ts',
  'app/bridge/deriveCase.ts',
  'app/bridge/planView.ts',
  // The run chunk (loadRunApi), sweep side included.
  'app/bridge/runApi.ts',
  'app/bridge/sweepApi.ts',
  'app/bridge/liveViews.ts',
  // The long-duct chunk (loadLongDuctApi).
  'app/bridge/longDuctApi.ts',
];

/**
 * app/ outside the bridge imports engine/ and workers/ modules as types only, so that no engine code lands in the
 * page's main bundle (the bridge loads it by dynamic import). The same holds for the lazily loaded modules
 * themselves (APP_BRIDGE): a static value import of one would pull its chunk, engine and all, into the main bundle,
 * so they are imported as types or loaded by import(). Relative specifiers are resolved against the file, so an app
 * folder named like an engine one (app/results/ beside engine/results/) is not mistaken for the engine.
 */
const engineTypesOnly = {
  meta: { type: 'problem', schema: [] },
  create(context) {
    const root = path.dirname(fileURLToPath(import.meta.url));
    const lazy = new Set(APP_BRIDGE.map((f) => f.replace(/\.tsx?$/, '')));
    const check = (node, source, isTypeOnly, isDynamic) => {
      if (isTypeOnly || typeof source !== 'string' || !source.startsWith('.')) return;
      const target = path.relative(root, path.resolve(path.dirname(context.filename), source)).split(path.sep);
      if (target[0] === 'engine' || target[0] === 'workers') {
        context.report({
          node,
          message: `'${source}' is ${target[0]}/ code: import it as a type here, or use it through app/bridge/ (a lazy chunk)`,
        });
      } else if (!isDynamic && lazy.has(target.join('/').replace(/\.tsx?$/, ''))) {
        context.report({
          node,
          message: `'${source}' is lazily loaded (APP_BRIDGE): import it as a type here, or through app/bridge/loadEngine.ts`,
        });
      }
    };
    const allTypes = (node) =>
      node.importKind === 'type' ||
      node.exportKind === 'type' ||
      (node.specifiers?.length > 0 && node.specifiers.every((s) => s.importKind === 'type' || s.exportKind === 'type'));
    return {
      ImportDeclaration: (node) => check(node, node.source.value, allTypes(node), false),
      ExportNamedDeclaration: (node) => node.source && check(node, node.source.value, allTypes(node), false),
      ExportAllDeclaration: (node) => check(node, node.source.value, node.exportKind === 'type', false),
      ImportExpression: (node) => node.source.type === 'Literal' && check(node, node.source.value, false, true),
    };
  },
};

export default tseslint.config(
  {
    ignores: [
      'dist/**',
      'dist-cli/**',
      'node_modules/**',
      'test-results/**',
      'playwright-report/**',
      'public/**',
      '**/*.d.ts',
      '**/*.d.mts',
    ],
  },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    files: ['**/*.{ts,tsx,js,mjs}'],
    plugins: { 'import-x': importX },
    settings: {
      ...importX.flatConfigs.typescript.settings,
      'import-x/resolver': undefined,
      'import-x/resolver-next': [createTypeScriptImportResolver({ alwaysTryTypes: true })],
    },
    languageOptions: {
      ecmaVersion: 2022,
      sourceType: 'module',
      globals: {
        console: 'readonly',
        performance: 'readonly',
        setTimeout: 'readonly',
        clearTimeout: 'readonly',
        setInterval: 'readonly',
        clearInterval: 'readonly',
        queueMicrotask: 'readonly',
        structuredClone: 'readonly',
        TextEncoder: 'readonly',
        TextDecoder: 'readonly',
        URL: 'readonly',
        process: 'readonly',
      },
    },
    rules: {
      'import-x/no-cycle': ['error', { ignoreExternal: true }],
      'import-x/no-self-import': 'error',
      '@typescript-eslint/consistent-type-imports': [
        'error',
        { prefer: 'type-imports', fixStyle: 'inline-type-imports', disallowTypeAnnotations: false },
      ],
      // The numeric code uses `any` only at JSON edges and in tests; flag it, do not fail on it.
      '@typescript-eslint/no-explicit-any': 'off',
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      'no-constant-condition': ['error', { checkLoops: false }],
    },
  },
  {
    files: ['engine/**/*.ts'],
    rules: {
      'import-x/no-restricted-paths': [
        'error',
        {
          zones: [
            {
              target: './engine',
              from: ['./app', './workers', './cli', './bench', './tests'],
              message: 'engine/ is pure TypeScript and imports nothing from app/, workers/, cli/, bench/ or tests/',
            },
            ...engineLayerZones(),
          ],
        },
      ],
    },
  },
  {
    files: ['workers/**/*.ts'],
    rules: {
      'import-x/no-restricted-paths': [
        'error',
        {
          zones: [
            {
              target: './workers',
              from: ['./app', './cli'],
              message: 'workers/ runs the engine for both app/ and cli/ and imports neither',
            },
          ],
        },
      ],
    },
  },
  {
    files: ['cli/**/*.ts'],
    rules: {
      'import-x/no-restricted-paths': [
        'error',
        { zones: [{ target: './cli', from: ['./app'], message: 'cli/ never imports the browser app' }] },
      ],
    },
  },
  {
    files: ['app/**/*.{ts,tsx}'],
    ignores: APP_BRIDGE,
    plugins: { tenuis: { rules: { 'engine-types-only': engineTypesOnly } } },
    rules: { 'tenuis/engine-types-only': 'error' },
  },
  {
    files: ['tests/**/*.ts', 'bench/**/*.ts', 'cli/**/*.ts', 'bin/**/*.mjs', '*.ts', '*.js'],
    languageOptions: { globals: { Buffer: 'readonly', __dirname: 'readonly' } },
  },
);
