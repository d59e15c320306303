/** Shared result types of the exposure classification under EN 206 and ACI 318. */

/** One class assigned to the exposure, with why and where from. */
export type ClassAssignment = {
  exposureClass: string;
  /** EN 206: X0, XC, XD, XS, XF, XA. ACI 318: F, S, W, C. */
  family: string;
  description: string;
  /** Why this class: the input values and the table row they fall in. */
  basis: string;
  /** The standard's table. */
  source: string;
};

/** What one measured characteristic gives on its own. */
export type CharacteristicFinding = {
  characteristic: string;
  label: string;
  value: number;
  unit: string;
  /** Class of the band the value falls in; null where below the first class (not aggressive). */
  exposureClass: string | null;
  /** The band in words, e.g. "> 600 and ≤ 3000 mg/L". */
  band?: string;
  /** How the value was obtained where it was not entered directly. */
  derivedFrom?: string;
  source: string;
};
