// US customary is what the plans are drawn in; SI is carried beside it for reviewers who think in
// metric. Factors are the exact definitions (international foot, avoirdupois pound, standard
// gravity), so round trips do not drift.

export const M_PER_FT = 0.3048;
export const MM_PER_IN = 25.4;
/** 1 kip = 1000 lbf; 1 lbf = 0.45359237 kg x 9.80665 m/s^2. */
export const KN_PER_KIP = 4.4482216152605;
export const KNM_PER_KIPFT = KN_PER_KIP * M_PER_FT;
/** 1 cy = 27 ft^3. */
export const M3_PER_CY = 27 * M_PER_FT ** 3;
export const KN_PER_M_PER_KIP_PER_FT = KN_PER_KIP / M_PER_FT;

export const ftToM = (ft: number): number => ft * M_PER_FT;
export const mToFt = (m: number): number => m / M_PER_FT;
export const inToMm = (inches: number): number => inches * MM_PER_IN;
export const mmToIn = (mm: number): number => mm / MM_PER_IN;
export const kipToKn = (kip: number): number => kip * KN_PER_KIP;
export const knToKip = (kn: number): number => kn / KN_PER_KIP;
export const kipFtToKnM = (kipFt: number): number => kipFt * KNM_PER_KIPFT;
export const knMToKipFt = (knM: number): number => knM / KNM_PER_KIPFT;
export const kipPerFtToKnPerM = (kipPerFt: number): number => kipPerFt * KN_PER_M_PER_KIP_PER_FT;
export const knPerMToKipPerFt = (knPerM: number): number => knPerM / KN_PER_M_PER_KIP_PER_FT;
export const cyToM3 = (cy: number): number => cy * M3_PER_CY;
export const m3ToCy = (m3: number): number => m3 / M3_PER_CY;
export const ftToIn = (ft: number): number => ft * 12;
export const fToC = (f: number): number => ((f - 32) * 5) / 9;
export const cToF = (c: number): number => (c * 9) / 5 + 32;
/** A temperature difference (or a coefficient per degree) has no 32-degree offset. */
export const perFToPerC = (perF: number): number => (perF * 9) / 5;
export const deltaFToDeltaC = (deltaF: number): number => (deltaF * 5) / 9;
