/**
 * The examples shelf: invented sections from the trade, one JSON file each in public/examples/
 * (served beside the app, and read by the command line straight from there). The shelf is the
 * files that are there when the app is built (each file is its own small chunk, loaded when it is
 * opened, with no request to any server); the list below gives each its place in the menu, its
 * title and one line. A file without a line here still appears, after the others, under its name.
 * tests/examples.test.ts pins each example's headline values against a hand calculation.
 */

export interface ExampleEntry {
  /** File name in public/examples/. */
  file: string;
  /** Menu title. */
  title: string;
  /** One line: what it shows. */
  blurb: string;
}

/** Menu order, titles and lines, for the files the shelf holds (or will hold). */
const DESCRIBED: readonly ExampleEntry[] = [
  { file: 'bent-plate-bracket.json', title: 'Bent-plate bracket with bolt holes', blurb: '8 mm plate bent to an angle; net section through three M16 holes' },
  { file: 'crane-rail-girder.json', title: 'Crane runway girder', blurb: 'Welded I with a cap channel toes down and a flat-bar rail' },
  { file: 'perforated-cover-plate.json', title: 'Perforated cover plates', blurb: 'Box strut of four plates; net section through the access holes' },
  { file: 'aluminium-extrusion.json', title: 'Aluminium extrusion with screw bosses', blurb: 'Hollow rail 80 × 50 with four Ø9 bosses for end-cap screws' },
  { file: 'cope-proposal.json', title: 'Cope proposal on an IPE 300', blurb: 'Baseline beam and a fabricator’s top cope, with limits to check' },
  { file: 'flitch-beam.json', title: 'Timber joist with a steel flitch plate', blurb: 'Two materials: the transformed section, stresses under load' },
  { file: 'welded-bracket.json', title: 'Welded bracket', blurb: 'A bent plate and its weld group as line elements' },
];

const LOADERS = import.meta.glob<string>('../../public/examples/*.json', { query: '?raw', import: 'default' });
const byFile = new Map(Object.entries(LOADERS).map(([path, load]) => [path.slice(path.lastIndexOf('/') + 1), load]));

function titleOf(file: string): string {
  const words = file.replace(/\.json$/, '').replace(/[-_]+/g, ' ');
  return words.charAt(0).toUpperCase() + words.slice(1);
}

/** The examples on the shelf, in menu order. */
export const EXAMPLE_SHELF: readonly ExampleEntry[] = [
  ...DESCRIBED.filter((e) => byFile.has(e.file)),
  ...[...byFile.keys()]
    .filter((f) => !DESCRIBED.some((e) => e.file === f))
    .sort()
    .map((file) => ({ file, title: titleOf(file), blurb: '' })),
];

/** The text of an example on the shelf (rejects for a file that is not there). */
export function exampleText(file: string): Promise<string> {
  const load = byFile.get(file);
  return load ? load() : Promise.reject(new Error(`public/examples/${file} is not on the shelf`));
}
