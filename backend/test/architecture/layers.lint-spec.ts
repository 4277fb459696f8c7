import { join } from 'node:path';
import { ESLint } from 'eslint';
import { beforeAll, describe, expect, it } from 'vitest';

// The back end's layers and import cycles are ESLint rules (BACKEND_LAYERS in eslint.config.mjs); this suite runs
// them over backend/src, so a change that imports upward or closes a cycle fails `npm test`, not only `npm run lint`.
const ROOT = join(__dirname, '..', '..', '..');
const IMPORT_RULES = ['import/no-restricted-paths', 'import/no-cycle'];

function importProblems(results: ESLint.LintResult[]): string[] {
  return results.flatMap((r) =>
    r.messages
      .filter((m) => m.ruleId && IMPORT_RULES.includes(m.ruleId))
      .map((m) => `${r.filePath.slice(ROOT.length + 1)}:${m.line} ${m.ruleId} ${m.message}`),
  );
}

describe('back-end layers', () => {
  let eslint: ESLint;
  // For snippets that are not files: no-cycle needs the file on disk, and the layer rule is what they probe.
  let snippets: ESLint;
  beforeAll(() => {
    eslint = new ESLint({ cwd: ROOT });
    snippets = new ESLint({ cwd: ROOT, overrideConfig: { rules: { 'import/no-cycle': 'off' } } });
  });

  it('no file of backend/src imports a layer above its own or closes an import cycle', async () => {
    expect(importProblems(await eslint.lintFiles(['backend/src']))).toEqual([]);
  }, 300_000);

  it('refuses a shared folder that imports a feature (journal/ → lakes/)', async () => {
    const code = "import { Lake } from '../lakes/lake.entity';\nexport const kinds = [Lake];\n";
    const results = await snippets.lintText(code, { filePath: join(ROOT, 'backend/src/journal/upward.ts') });
    expect(importProblems(results)).toEqual([expect.stringContaining('import/no-restricted-paths')]);
  });

  it('refuses a feature that imports the reports above it (catches/ → reports/)', async () => {
    const code = "import { ReportsModule } from '../reports/reports.module';\nexport const m = ReportsModule;\n";
    const results = await snippets.lintText(code, { filePath: join(ROOT, 'backend/src/catches/upward.ts') });
    expect(importProblems(results)).toEqual([expect.stringContaining('a layer above its own')]);
  });

  it('lets a feature import the shared journal below it (catches/ → journal/)', async () => {
    const code = "import { recordNotFound } from '../journal/journal-errors';\nexport const e = recordNotFound;\n";
    const results = await snippets.lintText(code, { filePath: join(ROOT, 'backend/src/catches/downward.ts') });
    expect(importProblems(results)).toEqual([]);
  });
});
