/**
 * The structure of the code, checked: the engine (src/) imports no UI or DOM (the lint rule of
 * the design card), and nothing in app/ or src/ imports in a circle, file by file or folder by
 * folder. Project rules, no outside source.
 */
import { ESLint } from 'eslint';
import { describe, expect, it } from 'vitest';
import { collapse, cycles, importGraph, sourceFiles } from './import-graph';

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

describe('import graph', () => {
  const graph = importGraph([...sourceFiles('src'), ...sourceFiles('app')]);

  it('reads the imports it should (a walk that finds nothing would pass every check)', () => {
    expect(graph.size).toBeGreaterThan(100);
    expect(graph.get('app/editor.ts')).toContain('app/command-table.ts');
    expect(graph.get('src/index.ts')).toContain('src/evaluate.ts');
  });

  it('has no import cycle between files, in app/ or src/', () => {
    expect(cycles(graph)).toEqual([]);
  });

  it('has no cycle between the folders of app/ or of src/ (each folder sits on one floor)', () => {
    for (const top of ['app', 'src']) {
      const inTop = new Map([...graph].filter(([f]) => f.startsWith(`${top}/`)).map(([f, d]) => [f, d.filter((x) => x.startsWith(`${top}/`))]));
      // A folder, or a file directly in the top folder, is one unit.
      const unit = (f: string) => f.split('/').slice(0, 2).join('/').replace(/\.tsx?$/, '');
      expect(cycles(collapse(inTop, unit)), top).toEqual([]);
    }
  });

  it('finds a cycle when there is one (the check can fail)', () => {
    const g = new Map([
      ['a', ['b']],
      ['b', ['c']],
      ['c', ['a']],
      ['d', ['a']],
    ]);
    expect(cycles(g)).toEqual([['a', 'b', 'c']]);
  });
});
