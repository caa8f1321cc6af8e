/**
 * The layer rule of eslint.config.js (DEVELOPERS.md, "Layers"): an import of a layer above is
 * an error; imports down the layers are fine. Lints small texts as if they sat in each folder.
 */
import { ESLint } from 'eslint';
import { describe, expect, it } from 'vitest';

const eslint = new ESLint({ cwd: process.cwd() });

/** The messages of the layer rule for `code` placed at `path`. */
async function layerErrors(path: string, code: string): Promise<string[]> {
  const [result] = await eslint.lintText(code, { filePath: path });
  return result.messages.filter((m) => m.ruleId === 'no-restricted-imports').map((m) => m.message);
}

describe('layer rule', { timeout: 60_000 }, () => {
  it.each([
    ['src/lib/physics/fittings/x.ts', "import type { Id } from '../../model/types';"],
    ['src/lib/units/x.ts', "import { g } from '../physics/constants';"],
    ['src/lib/model/x.ts', "import { solve } from '../solver/solve';"],
    ['src/lib/solver/x.ts', "import { line } from '../chart/profileChart';"],
    ['src/lib/chart/x.ts', "import { sheet } from '../report/reviewSheet';"],
    ['src/lib/report/x.ts', "import { editor } from '$lib/ui/editor.svelte';"],
    ['src/lib/ui/x.ts', "import { main } from '../../cli/main';"],
    ['src/cli/x.ts', "import { editor } from '../lib/ui/editor.svelte';"],
    ['src/lib/solver/x.ts', "import { mount } from 'svelte';"],
  ])('refuses an upward import in %s', async (path, code) => {
    const errors = await layerErrors(path, `${code}\nexport const used = 1;\n`);
    expect(errors.length, `${path}: ${code}`).toBe(1);
  });

  it.each([
    ['src/lib/physics/fittings/x.ts', "import { parseQuantity } from '../../units';"],
    ['src/lib/model/x.ts', "import { frictionFactor } from '../physics/friction';"],
    ['src/lib/solver/x.ts', "import type { Id } from '../model/types';"],
    ['src/lib/report/x.ts', "import { profileSvg } from '../chart/profileSvg';"],
    ['src/lib/ui/x.ts', "import { solve } from '../solver/solve';"],
    ['src/cli/x.ts', "import { solve } from '../lib/solver/solve';"],
  ])('accepts a downward import in %s', async (path, code) => {
    expect(await layerErrors(path, `${code}\nexport const used = 1;\n`)).toEqual([]);
  });
});
