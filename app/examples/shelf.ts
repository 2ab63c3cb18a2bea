/**
 * The examples shelf: invented sections from the trade, one JSON file each in public/examples/
 * (served beside the app, and read by the command line straight from there). The menu lists them
 * in this order; tests/examples.test.ts checks that this list and the folder agree and pins each
 * example's headline values against a hand calculation.
 */

export interface ExampleEntry {
  /** File name in public/examples/. */
  file: string;
  /** Menu title. */
  title: string;
  /** One line: what it shows. */
  blurb: string;
}

export const EXAMPLE_SHELF: readonly ExampleEntry[] = [
  { file: 'bent-plate-bracket.json', title: 'Bent-plate bracket with bolt holes', blurb: '8 mm plate bent to an angle; net section through three M16 holes' },
  { file: 'crane-rail-girder.json', title: 'Crane runway girder', blurb: 'Welded I with a cap channel toes down and a flat-bar rail' },
  { file: 'perforated-cover-plate.json', title: 'Perforated cover plates', blurb: 'Box strut of four plates; net section through the access holes' },
  { file: 'aluminium-extrusion.json', title: 'Aluminium extrusion with screw bosses', blurb: 'Hollow rail 80 × 50 with four Ø9 bosses for end-cap screws' },
  { file: 'cope-proposal.json', title: 'Cope proposal on an IPE 300', blurb: 'Baseline beam and a fabricator’s top cope, with limits to check' },
  // Two more belong here once their files are in public/examples/ (tests/examples.test.ts fails
  // until each file on the shelf is listed):
  //   { file: 'flitch-beam.json', title: 'Timber joist with a steel flitch plate', blurb: 'Two materials: the transformed section' },
  //   { file: 'welded-bracket.json', title: 'Welded bracket', blurb: 'A weld group as line elements' },
];

/** The URL of an example beside the running app. */
export function exampleUrl(file: string, base: string): string {
  return new URL(`examples/${file}`, base).href;
}
