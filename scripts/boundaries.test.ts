// The zones' allowed arrows (.dependency-cruiser.cjs) as part of `npm test`: the repository has no forbidden import,
// and a tree with one of each forbidden import is reported rule by rule (so the check can fail).
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { describeViolations, findBoundaryViolations } from './boundaries.mjs';

type Violation = { rule: string; from: string; to: string };

function writeTree(root: string, files: Record<string, string>) {
  for (const [path, text] of Object.entries(files)) {
    mkdirSync(dirname(join(root, path)), { recursive: true });
    writeFileSync(join(root, path), text);
  }
}

describe('boundaries between engine, contracts, figure kinds, server and web', () => {
  const fixture = mkdtempSync(join(tmpdir(), 'upwell-boundaries-'));
  afterAll(() => rmSync(fixture, { recursive: true, force: true }));

  it('the repository breaks none of the rules', async () => {
    const violations: Violation[] = await findBoundaryViolations();
    expect(violations, describeViolations(violations)).toEqual([]);
  }, 120_000);

  it('reports each forbidden import by its rule', async () => {
    writeTree(fixture, {
      'common/src/index.ts': "export * from './stats/mean';\n",
      'common/src/stats/mean.ts': "import { SECRET } from '../../../server/src/secret';\nexport const mean = SECRET;\n",
      'common/src/stats/sum.ts': "import { readFileSync } from 'node:fs';\nimport { MEAN_LABEL } from '../api/labels';\nexport const sum = [readFileSync, MEAN_LABEL];\n",
      'common/src/api/labels.ts': "import { spec } from '../figure-kinds/lag/spec';\nexport const MEAN_LABEL = spec;\n",
      'common/src/figure-kinds/lag/spec.ts': "import { page } from '../../../../web/src/page';\nexport const spec = page;\n",
      'server/src/secret.ts': "import { page } from '../../web/src/page';\nexport const SECRET = page;\n",
      'server/src/deep.ts': "import { mean } from '../../common/src/stats/mean';\nexport const deep = mean;\n",
      'server/demo-generator/src/seed.ts': "import { SECRET } from '../../src/secret';\nexport const seed = SECRET;\n",
      'server/src/lost.ts': "import { gone } from './gone';\nexport const lost = gone;\n",
      'web/src/page.ts': "import type { SECRET } from '../../server/src/secret';\nexport const page: typeof SECRET | 1 = 1;\n",
    });
    const violations: Violation[] = await findBoundaryViolations(fixture);
    const found = violations.map((v) => `${v.rule}: ${v.from} → ${v.to}`).sort();
    expect(found).toEqual(
      [
        'apps-use-the-common-entry: server/src/deep.ts → common/src/stats/mean.ts',
        'common-never-imports-apps: common/src/figure-kinds/lag/spec.ts → web/src/page.ts',
        'common-never-imports-apps: common/src/stats/mean.ts → server/src/secret.ts',
        'only-figure-routes-import-figure-kinds: common/src/api/labels.ts → common/src/figure-kinds/lag/spec.ts',
        'demo-generator-stands-alone: server/demo-generator/src/seed.ts → server/src/secret.ts',
        'engine-has-no-dependencies: common/src/stats/sum.ts → fs',
        'engine-imports-only-engine: common/src/stats/mean.ts → server/src/secret.ts',
        'engine-imports-only-engine: common/src/stats/sum.ts → common/src/api/labels.ts',
        'figure-kinds-import-only-contracts-and-engine: common/src/figure-kinds/lag/spec.ts → web/src/page.ts',
        'imports-resolve: server/src/lost.ts → ./gone',
        'server-never-imports-web: server/src/secret.ts → web/src/page.ts',
        'web-never-imports-server: web/src/page.ts → server/src/secret.ts',
      ].sort(),
    );
  }, 120_000);
});
