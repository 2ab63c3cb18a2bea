/**
 * A small import-graph walk over the sources, for the structure tests: every relative import and
 * re-export (`import type` included: a cycle of types is still a cycle a reader has to untangle),
 * resolved to a file, and the strongly connected components of the graph (Tarjan).
 */
import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';

export const ROOT = resolve(__dirname, '..');

export function sourceFiles(dir: string): string[] {
  const out: string[] = [];
  for (const name of readdirSync(join(ROOT, dir))) {
    const rel = join(dir, name);
    if (statSync(join(ROOT, rel)).isDirectory()) out.push(...sourceFiles(rel));
    else if (/\.tsx?$/.test(name) && !name.endsWith('.d.ts')) out.push(rel);
  }
  return out;
}

const IMPORT = /(?:^|\n)\s*(?:import|export)\s[^;]*?\sfrom\s+['"](\.[^'"]+)['"]|import\(\s*['"](\.[^'"]+)['"]\s*\)/g;

function resolveImport(from: string, spec: string): string | null {
  const base = join(dirname(from), spec);
  for (const cand of [base, `${base}.ts`, `${base}.tsx`, join(base, 'index.ts'), join(base, 'index.tsx')]) {
    const abs = join(ROOT, cand);
    if (existsSync(abs) && statSync(abs).isFile()) return relative(ROOT, abs);
  }
  return null;
}

/** file -> the files it imports (relative imports only; packages are not part of the graph). */
export function importGraph(files: readonly string[]): Map<string, string[]> {
  const g = new Map<string, string[]>();
  for (const f of files) {
    const text = readFileSync(join(ROOT, f), 'utf8');
    const deps: string[] = [];
    for (const m of text.matchAll(IMPORT)) {
      const r = resolveImport(f, m[1] ?? m[2]);
      if (r) deps.push(r);
    }
    g.set(f, deps);
  }
  return g;
}

/** The same graph with each node replaced by `unit(node)`, self-edges dropped. */
export function collapse(g: Map<string, string[]>, unit: (f: string) => string): Map<string, string[]> {
  const out = new Map<string, Set<string>>();
  for (const [f, deps] of g) {
    const u = unit(f);
    if (!out.has(u)) out.set(u, new Set());
    for (const d of deps) if (unit(d) !== u) out.get(u)!.add(unit(d));
  }
  return new Map([...out].map(([k, v]) => [k, [...v]]));
}

/** Components of more than one node (each one an import cycle), by Tarjan's algorithm. */
export function cycles(g: Map<string, string[]>): string[][] {
  let counter = 0;
  const index = new Map<string, number>(), low = new Map<string, number>(), stack: string[] = [], on = new Set<string>();
  const out: string[][] = [];
  const visit = (v: string) => {
    index.set(v, counter);
    low.set(v, counter++);
    stack.push(v);
    on.add(v);
    for (const w of g.get(v) ?? []) {
      if (!index.has(w)) {
        visit(w);
        low.set(v, Math.min(low.get(v)!, low.get(w)!));
      } else if (on.has(w)) low.set(v, Math.min(low.get(v)!, index.get(w)!));
    }
    if (low.get(v) === index.get(v)) {
      const comp: string[] = [];
      let w: string;
      do {
        w = stack.pop()!;
        on.delete(w);
        comp.push(w);
      } while (w !== v);
      if (comp.length > 1) out.push(comp.sort());
    }
  };
  for (const v of g.keys()) if (!index.has(v)) visit(v);
  return out;
}
