export {
  type Damping,
  UNDAMPED,
  criticalDamping,
  dampingCoefficientFromRatio,
  dampingRatioFromCoefficient,
  dampingRatioFromLogDecrement,
  dampingRatioFromLossFactor,
  dampingRatioFromQualityFactor,
  equivalentViscousDampingRatio,
  hystereticDamping,
  logDecrementFromAmplitudes,
  logarithmicDecrement,
  lossFactorFromDampingRatio,
  qualityFactor,
  viscousDamping,
} from './damping.js';
export * from './natural-frequency.js';
export * from './static-deflection.js';
export * from './spring-surge.js';
export * from './series-stiffness.js';
