/** The material and stress palette (shared with the report, so it lives in the engine's src/analysis/palette.ts). */
export { materialColour, materialColours, stressColour, withAlpha, STRESS_INK } from '../../src';
