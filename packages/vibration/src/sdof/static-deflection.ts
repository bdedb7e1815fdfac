import { requirePositive } from '../errors/validate.js';
import { STANDARD_GRAVITY } from '../units/constants.js';

/**
 * Static deflection under a load: δ = W/k.
 * @param loadN W [N], > 0
 * @param stiffnessNPerM static stiffness k [N/m], > 0
 * @returns δ [m]
 */
export function staticDeflection(loadN: number, stiffnessNPerM: number): number {
  requirePositive('loadN', loadN);
  requirePositive('stiffnessNPerM', stiffnessNPerM);
  return loadN / stiffnessNPerM;
}

/**
 * Natural frequency from the static deflection, fn = (1/2π)·√(n_d·g/δ), g = 9.80665 m/s².
 * With n_d = 1 (steel springs) this is the familiar fn [Hz] ≈ 15.76/√δ[mm].
 * @param staticDeflectionM δ_st [m], > 0
 * @param dynamicStiffnessRatio n_d = k_dyn/k_st [–], > 0 (1 for steel; > 1 for elastomers)
 * @returns fn [Hz]
 */
export function naturalFrequencyFromStaticDeflection(staticDeflectionM: number, dynamicStiffnessRatio = 1): number {
  requirePositive('staticDeflectionM', staticDeflectionM);
  requirePositive('dynamicStiffnessRatio', dynamicStiffnessRatio);
  return Math.sqrt((dynamicStiffnessRatio * STANDARD_GRAVITY) / staticDeflectionM) / (2 * Math.PI);
}

/**
 * Static deflection that gives a natural frequency: δ = n_d·g/(2π·fn)².
 * @param naturalFrequencyHz fn [Hz], > 0
 * @param dynamicStiffnessRatio n_d [–], > 0
 * @returns δ_st [m]
 */
export function staticDeflectionForNaturalFrequency(naturalFrequencyHz: number, dynamicStiffnessRatio = 1): number {
  requirePositive('naturalFrequencyHz', naturalFrequencyHz);
  requirePositive('dynamicStiffnessRatio', dynamicStiffnessRatio);
  const w = 2 * Math.PI * naturalFrequencyHz;
  return (dynamicStiffnessRatio * STANDARD_GRAVITY) / (w * w);
}

/**
 * Dynamic stiffness from static stiffness: k_dyn = n_d·k_st.
 * @param staticStiffnessNPerM k_st [N/m], > 0
 * @param dynamicStiffnessRatio n_d [–], > 0
 * @returns k_dyn [N/m]
 */
export function dynamicStiffnessFromStatic(staticStiffnessNPerM: number, dynamicStiffnessRatio = 1): number {
  requirePositive('staticStiffnessNPerM', staticStiffnessNPerM);
  requirePositive('dynamicStiffnessRatio', dynamicStiffnessRatio);
  return staticStiffnessNPerM * dynamicStiffnessRatio;
}
