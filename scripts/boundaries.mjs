// The boundary check of `npm test`: cruises the repository with .dependency-cruiser.cjs and returns every forbidden
// import. Run by scripts/boundaries.test.ts; `node scripts/boundaries.mjs` prints the same list by hand.
import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { cruise } from 'dependency-cruiser';
import extractDepcruiseOptions from 'dependency-cruiser/config-utl/extract-depcruise-options';
import extractTSConfig from 'dependency-cruiser/config-utl/extract-ts-config';

/** The repository root (this file lives in scripts/). */
export const REPO_ROOT = resolve(fileURLToPath(new URL('..', import.meta.url)));

/** The top folders the check reads; each is cruised when it exists under `baseDir`. */
export const CHECKED_FOLDERS = ['common', 'server', 'web', 'e2e', 'scripts'];

/**
 * Every import in `baseDir` (default: the repository) that breaks a rule of .dependency-cruiser.cjs, as
 * `{ rule, from, to }` with paths relative to `baseDir`.
 */
export async function findBoundaryViolations(baseDir = REPO_ROOT) {
  const options = await extractDepcruiseOptions(join(REPO_ROOT, '.dependency-cruiser.cjs'));
  const tsConfigFile = join(REPO_ROOT, options.tsConfig.fileName);
  options.tsConfig = { fileName: tsConfigFile };
  options.baseDir = baseDir;
  const folders = CHECKED_FOLDERS.filter((folder) => existsSync(join(baseDir, folder)));
  const result = await cruise(folders, options, {}, { tsConfig: extractTSConfig(tsConfigFile) });
  return result.output.summary.violations.map((v) => ({ rule: v.rule.name, from: v.from, to: v.to }));
}

/** One line per violation, for a failing test's message. */
export function describeViolations(violations) {
  return violations.map((v) => `${v.rule}: ${v.from} → ${v.to}`).join('\n');
}

if (process.argv[1] && resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  const violations = await findBoundaryViolations();
  console.log(violations.length === 0 ? 'no boundary violations' : describeViolations(violations));
  process.exit(violations.length === 0 ? 0 : 1);
}
