/** The caution printed with every set of results (panel, CLI, report): one wording, shared. */
export const CAUTION_TEXT = 'Geometric properties only. The design must be checked against the applicable code by a qualified engineer.';
