/**
 * Migrations between section-document versions. Each entry upgrades a document of version v to
 * v + 1; `migrate` applies them in order until the current version (tests/document.test.ts
 * checks that saved files of every older version still open).
 */
import { CURRENT_VERSION } from './types';

type Migration = (doc: Record<string, unknown>) => Record<string, unknown>;

const MIGRATIONS: Record<number, Migration> = {
  // Version 2 only adds optional fields (variants, limits, materials, loads, checker fields):
  // a version-1 document is a version-2 document with only a baseline.
  1: (doc) => ({ ...doc }),
};

export const KNOWN_VERSIONS: number[] = Array.from({ length: CURRENT_VERSION }, (_, k) => k + 1);

export function migrate(doc: Record<string, unknown>): Record<string, unknown> {
  let out = doc;
  for (let v = out.version as number; v < CURRENT_VERSION; v++) {
    const step = MIGRATIONS[v];
    if (!step) throw new Error(`no migration from version ${v}`);
    out = { ...step(out), version: v + 1 };
  }
  return out;
}
