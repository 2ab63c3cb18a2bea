/**
 * Migrations between section-document versions. Each entry upgrades a document of version v to
 * v + 1; `migrate` applies them in order until the current version. Version 1 is the first, so
 * there is nothing to upgrade yet; a future version 2 adds `1: (doc) => ...` here and a test in
 * tests/document.test.ts that a saved version-1 file still opens.
 */
import { CURRENT_VERSION } from './types';

type Migration = (doc: Record<string, unknown>) => Record<string, unknown>;

const MIGRATIONS: Record<number, Migration> = {};

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
