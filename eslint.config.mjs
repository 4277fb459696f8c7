// ESLint flat config for every workspace.
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import reactHooks from 'eslint-plugin-react-hooks';
import importPlugin from 'eslint-plugin-import';
import globals from 'globals';

/**
 * The back end's layers, bottom first: a folder (or file) of `backend/src` may import its own layer and the ones
 * below, never one above (docs/architecture.md). `crews/access` (who may do what in a crew) sits low because every
 * controller guards with it; the rest of `crews/` (removal and hand-over touch every feature) sits above the
 * features.
 */
const BACKEND_LAYERS = [
  ['config'],
  ['common'],
  [
    'users',
    'auth',
    'mail',
    'storage',
    'idempotency',
    'read-models',
    'crews/access',
    'crews/crew.entity.ts',
    'crews/membership.entity.ts',
    'crews/invite.entity.ts',
  ],
  ['journal', 'journal-events'],
  ['lakes', 'events', 'finds', 'catches', 'stops', 'weigh-ins', 'photos', 'sky', 'exports', 'imports', 'measurements'],
  ['reports', 'projections', 'crews', 'admin', 'health', 'dev-outbox'],
  ['database', 'app.module.ts', 'configure-app.ts', 'main.ts'],
];
const LOW_CREW_PARTS = ['./access', './crew.entity.ts', './membership.entity.ts', './invite.entity.ts'];

function layerZones() {
  const src = './backend/src';
  return BACKEND_LAYERS.flatMap((layer, index) =>
    layer.map((target) => ({
      target: `${src}/${target}`,
      from: BACKEND_LAYERS.slice(index + 1)
        .flat()
        .filter((above) => !target.startsWith(`${above}/`) && !(above === 'crews' && index >= 5)),
      except: undefined,
    })),
  ).flatMap(({ target, from }) =>
    from.map((above) => ({
      target,
      from: `${src}/${above}`,
      ...(above === 'crews' ? { except: LOW_CREW_PARTS } : {}),
      message: 'imports a layer above its own (see BACKEND_LAYERS in eslint.config.mjs)',
    })),
  );
}

export default tseslint.config(
  { ignores: ['**/dist/**', '**/node_modules/**', '.data/**', '**/migrations/**', '**/coverage/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node } },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
    },
  },
  {
    files: ['backend/src/**/*.ts'],
    plugins: { import: importPlugin },
    settings: importPlugin.flatConfigs.typescript.settings,
    rules: {
      // Zones are relative to the repository root, wherever ESLint is started from (the layer test runs in backend/).
      'import/no-restricted-paths': ['error', { basePath: import.meta.dirname, zones: layerZones() }],
      'import/no-cycle': ['error', { ignoreExternal: true }],
    },
  },
  {
    files: ['frontend/public/**/*.js'],
    languageOptions: { globals: { ...globals.serviceworker } },
  },
  {
    files: ['frontend/src/**/*.{ts,tsx}'],
    languageOptions: { globals: { ...globals.browser } },
    plugins: { 'react-hooks': reactHooks },
    rules: { ...reactHooks.configs.recommended.rules },
  },
);
