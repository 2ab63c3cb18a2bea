/** The design card's layering rule, enforced by lint: the engine (src/) imports no UI or DOM. */
import { ESLint } from 'eslint';
import { describe, expect, it } from 'vitest';

const eslint = new ESLint();

async function ruleIds(code: string, filePath: string): Promise<string[]> {
  const [res] = await eslint.lintText(code, { filePath });
  return res.messages.map((m) => m.ruleId ?? m.message);
}

describe('lint layering rule', () => {
  it('refuses React, Konva, zustand and app/ imports in src/', async () => {
    for (const mod of ['react', 'konva', 'react-konva', 'zustand', 'react-dom/client', '../app/store']) {
      expect(await ruleIds(`import x from '${mod}';\nexport const y = x;\n`, 'src/geometry/probe.ts')).toContain('no-restricted-imports');
    }
  });
  it('refuses DOM and Node globals in src/', async () => {
    expect(await ruleIds('export const w = window.innerWidth;\n', 'src/geometry/probe.ts')).toContain('no-restricted-globals');
    expect(await ruleIds('export const d = process.env.DEBUG;\n', 'src/geometry/probe.ts')).toContain('no-restricted-globals');
  });
  it('allows the same imports in app/', async () => {
    expect(await ruleIds(`import { create } from 'zustand';\nexport const s = create;\n`, 'app/probe.ts')).not.toContain('no-restricted-imports');
  });
});
