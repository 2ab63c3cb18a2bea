/**
 * The demo section loaded on first start. An invented scenario: an edge beam for a
 * walkway canopy, built up from a rolled I with a welded cover plate, checked at the section
 * through a round web penetration proposed for a conduit. All dimensions are invented.
 */
import type { SectionDocument } from './types';

export const DEMO_DOCUMENT: SectionDocument = {
  format: 'kern-section',
  version: 2,
  units: 'mm',
  name: 'Canopy edge beam at conduit opening',
  title: {
    project: 'Riverside walkway canopy (demo)',
    section: 'EB-1 at web opening',
    author: 'A. Drafter',
    checker: '',
    date: '2026-12-02',
    revision: 'A',
  },
  shapes: [
    {
      id: 'beam',
      name: 'Rolled I 200 × 100',
      type: 'i-beam',
      at: [-50, 0],
      depth: 200,
      flangeWidth: 100,
      flangeThickness: 8.5,
      webThickness: 5.6,
      rootRadius: 12,
    },
    { id: 'cover', name: 'Cover plate 160 × 10', type: 'rectangle', at: [-80, 200], width: 160, height: 10 },
    { id: 'opening', name: 'Conduit opening Ø60', type: 'circle', center: [0, 90], radius: 30, op: 'subtract' },
  ],
};
