/**
 * `kern schema [--version 1|2]`: print the JSON Schema of the section document (version 2 unless
 * asked), the same text as public/kern-section.schema.json (public/kern-section.v1.schema.json).
 * For editors and other tools; Kern's own validation of a file is `kern props FILE`.
 */
import { SCHEMA_VERSIONS, sectionDocumentSchemaText, type SchemaVersion } from '../src/document/schema';
import { parseArgs, UsageError } from './main';

export function schemaCommand(args: string[]): number {
  const a = parseArgs(args, ['version']);
  if (a.positional.length) throw new UsageError(`schema takes no file (got "${a.positional[0]}")`);
  const raw = a.flags.get('version') ?? '2';
  const version = Number(raw);
  if (!(SCHEMA_VERSIONS as readonly number[]).includes(version)) throw new UsageError(`--version must be ${SCHEMA_VERSIONS.join(' or ')}, got "${raw === true ? '' : raw}"`);
  process.stdout.write(sectionDocumentSchemaText(version as SchemaVersion));
  return 0;
}
