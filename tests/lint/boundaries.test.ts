import { existsSync, mkdirSync, rmSync, writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { ESLint } from 'eslint';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

// The layering rules in eslint.config.js must be able to fail: each case lints a deliberate violation placed where a
// newcomer could write it and expects the rule to name it; the allowed imports beside them must stay clean.
const ROOT = resolve(import.meta.dirname, '../..');
const eslint = new ESLint({ cwd: ROOT });

/** Writes the probe where a newcomer would (the type-aware parser only reads files on disk), lints it, removes it. */
async function ruleIds(filePath: string, code: string): Promise<string[]> {
  const file = join(ROOT, filePath.replace(/\.ts$/, `-${process.pid}.ts`));
  const existed = existsSync(file);
  if (!existed) writeFileSync(file, code);
  try {
    const [result] = await eslint.lintFiles([file]);
    return (result?.messages ?? []).map((m) => m.ruleId ?? `fatal: ${m.message}`);
  } finally {
    if (!existed) rmSync(file, { force: true });
  }
}

describe('architecture lint', () => {
  it.each([
    [
      'a feature importing another feature by alias',
      'apps/web/src/features/boats/lint-probe.ts',
      "import { specDetails } from '@/features/exchange/utils/format';\nexport const probe = specDetails;\n",
    ],
    [
      'a feature importing another feature by relative path',
      'apps/web/src/features/boats/lint-probe.ts',
      "import { specDetails } from '../exchange/utils/format';\nexport const probe = specDetails;\n",
    ],
    [
      'shared lib code importing a feature',
      'apps/web/src/lib/lint-probe.ts',
      "import { specDetails } from '@/features/exchange/utils/format';\nexport const probe = specDetails;\n",
    ],
    [
      'a shared component importing the app shell',
      'apps/web/src/components/ui/lint-probe.ts',
      "import { APP_ROUTES } from '@/app/router';\nexport const probe = APP_ROUTES;\n",
    ],
    [
      'the web app importing the API',
      'apps/web/src/lib/lint-probe.ts',
      "import { AppError } from '../../../api/src/errors/app-error';\nexport const probe = AppError;\n",
    ],
    [
      'a package importing an app',
      'packages/calc/src/lint-probe.ts',
      "import { paths } from '../../../apps/web/src/config/paths';\nexport const probe = paths;\n",
    ],
    [
      'an app importing the orchestration scripts',
      'apps/api/src/lib/lint-probe.ts',
      "import { CLUSTER_DIR } from '../../../../scripts/lib/cluster.mjs';\nexport const probe = CLUSTER_DIR;\n",
    ],
    [
      'a seeder importing a migration',
      'apps/api/seeders/lint-probe.ts',
      "import { up } from '../migrations/20261201-0003-knowledge';\nexport const probe = up;\n",
    ],
  ])('refuses %s', async (_name, filePath, code) => {
    expect(await ruleIds(filePath, code)).toContain('import-x/no-restricted-paths');
  });

  it.each([
    [
      'a schema imported into a screen',
      'apps/web/src/features/boats/lint-probe.ts',
      "import { boatInputSchema } from '@app/shared';\nexport const probe = boatInputSchema;\n",
    ],
    [
      'zod imported into a screen',
      'apps/web/src/features/boats/lint-probe.ts',
      "import { z } from 'zod';\nexport const probe = z.string();\n",
    ],
    [
      'the zod resolver imported into a screen',
      'apps/web/src/components/ui/lint-probe.ts',
      "import { zodResolver } from '@hookform/resolvers/zod';\nexport const probe = zodResolver;\n",
    ],
  ])('keeps schemas out of first loads: refuses %s', async (_name, filePath, code) => {
    expect(await ruleIds(filePath, code)).toContain('@typescript-eslint/no-restricted-imports');
  });

  it('lets a screen import shared types, vocabulary and the lazy schema loader', async () => {
    expect(
      await ruleIds(
        'apps/web/src/features/boats/lint-probe.ts',
        "import type { BoatDto } from '@app/shared';\nimport type { z } from 'zod';\nimport { HULLS } from '@app/shared/values';\nimport { lazyResolver } from '@/lib/lazy-schema';\nexport const probe = [HULLS, lazyResolver((s) => s.boatInputSchema)] as const;\nexport type Probe = BoatDto | z.ZodType;\n",
      ),
    ).toEqual([]);
  });

  it('allows a feature to use its own files, shared code and workspace packages', async () => {
    const code = [
      "import { STANDARD_CAUTIONS } from '@app/calc';",
      "import { cn } from '@/lib/cn';",
      "import { Quantity } from '@/components/units/quantity';",
      "import { specDetails } from '../utils/format';",
      'export const probe = [STANDARD_CAUTIONS, cn, Quantity, specDetails];',
      '',
    ].join('\n');
    expect(await ruleIds('apps/web/src/features/exchange/components/lint-probe.ts', code)).toEqual(
      [],
    );
  });

  describe('import cycles', () => {
    const dir = join(ROOT, 'apps/web/src/lib/lint-cycle-probe');
    beforeAll(() => {
      mkdirSync(dir, { recursive: true });
      writeFileSync(join(dir, 'a.ts'), "import { b } from './b';\nexport const a = () => b();\n");
      writeFileSync(join(dir, 'b.ts'), "import { a } from './a';\nexport const b = () => a();\n");
    });
    afterAll(() => rmSync(dir, { recursive: true, force: true }));

    it('refuses two modules that import each other', async () => {
      const [result] = await eslint.lintFiles([join(dir, 'a.ts')]);
      const ids = (result?.messages ?? []).map((m) => m.ruleId);
      expect(ids).toContain('import-x/no-cycle');
    });
  });
});
