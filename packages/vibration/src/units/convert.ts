import { KG_PER_LB, MM_PER_IN, M_PER_IN, N_PER_KGF, N_PER_LBF, N_PER_M_PER_LBF_PER_IN, W_PER_HP } from './constants.js';

/** kg → lb */
export const kgToLb = (kg: number): number => kg / KG_PER_LB;
/** lb → kg */
export const lbToKg = (lb: number): number => lb * KG_PER_LB;
/** N → lbf */
export const nToLbf = (n: number): number => n / N_PER_LBF;
/** lbf → N */
export const lbfToN = (lbf: number): number => lbf * N_PER_LBF;
/** m → in */
export const mToIn = (m: number): number => m / M_PER_IN;
/** in → m */
export const inToM = (inch: number): number => inch * M_PER_IN;
/** m → mm */
export const mToMm = (m: number): number => m * 1000;
/** mm → m */
export const mmToM = (mm: number): number => mm / 1000;
/** N/m → N/mm */
export const nPerMToNPerMm = (nPerM: number): number => nPerM / 1000;
/** N/mm → N/m */
export const nPerMmToNPerM = (nPerMm: number): number => nPerMm * 1000;
/** N/m → lbf/in */
export const nPerMToLbfPerIn = (nPerM: number): number => nPerM / N_PER_M_PER_LBF_PER_IN;
/** lbf/in → N/m */
export const lbfPerInToNPerM = (lbfPerIn: number): number => lbfPerIn * N_PER_M_PER_LBF_PER_IN;
/** Hz → rev/min (1 Hz = 60 rpm) */
export const hzToRpm = (hz: number): number => hz * 60;
/** rev/min → Hz */
export const rpmToHz = (rpm: number): number => rpm / 60;
/** Hz → cycles/min (cpm); numerically the same as rpm */
export const hzToCpm = (hz: number): number => hz * 60;
/** cycles/min → Hz */
export const cpmToHz = (cpm: number): number => cpm / 60;
/** °C → °F */
export const cToF = (c: number): number => c * 1.8 + 32;
/** °F → °C */
export const fToC = (f: number): number => (f - 32) / 1.8;
/** kgf → N (1 kgf = 9.80665 N, exact) */
export const kgfToN = (kgf: number): number => kgf * N_PER_KGF;
/** N → kgf */
export const nToKgf = (n: number): number => n / N_PER_KGF;
/** mm → in (1 in = 25.4 mm, exact) */
export const mmToIn = (mm: number): number => mm / MM_PER_IN;
/** in → mm */
export const inToMm = (inch: number): number => inch * MM_PER_IN;
/** N/mm → lbf/in (1 lbf/in ≈ 0.1751268 N/mm) */
export const nPerMmToLbfPerIn = (nPerMm: number): number => (nPerMm * 1000) / N_PER_M_PER_LBF_PER_IN;
/** lbf/in → N/mm */
export const lbfPerInToNPerMm = (lbfPerIn: number): number => (lbfPerIn * N_PER_M_PER_LBF_PER_IN) / 1000;
/** kgf/mm → N/m (stiffness in some catalogs) */
export const kgfPerMmToNPerM = (kgfPerMm: number): number => kgfPerMm * N_PER_KGF * 1000;
/** N/m → kgf/mm */
export const nPerMToKgfPerMm = (nPerM: number): number => nPerM / (N_PER_KGF * 1000);
/** kW → hp (mechanical horsepower, 745.7 W) */
export const kwToHp = (kw: number): number => (kw * 1000) / W_PER_HP;
/** hp → kW */
export const hpToKw = (hp: number): number => (hp * W_PER_HP) / 1000;
/** degrees → radians */
export const degToRad = (deg: number): number => (deg * Math.PI) / 180;
/** radians → degrees */
export const radToDeg = (rad: number): number => (rad * 180) / Math.PI;
