import { requireNonNegative, requirePositive } from '../errors/validate.js';

/** Input of {@link rockingStabilityCheck}. */
export interface RockingStabilityInput {
  /** Height of the CG above the mount plane h [m], ≥ 0. */
  cgHeightM: number;
  /** Static deflection of the mounts δ_st [m], > 0. */
  staticDeflectionM: number;
  /** Half the mount spacing along x, a [m]. */
  halfSpacingX: number;
  /** Half the mount spacing along y, b [m]. */
  halfSpacingY: number;
}

/** Result of {@link rockingStabilityCheck}. */
export interface RockingStabilityResult {
  /** h·δ_st [m²]. */
  heightTimesDeflection: number;
  /** a²/(h·δ) and b²/(h·δ): stability margins about y (pitch) and x (roll); > 1 is stable. */
  marginPitch: number;
  marginRoll: number;
  /** h·δ < a² and h·δ < b². */
  stable: boolean;
}

/**
 * Approximate gravity (rocking) stability of a high-CG machine on four equal mounts: gravity
 * subtracts ≈ W·h from the rocking stiffness, so stability needs a² > h·δ_st and b² > h·δ_st.
 * @param input h [m], δ_st [m], a [m], b [m]
 * @returns h·δ [m²], margins [–], stable flag
 */
export function rockingStabilityCheck(input: RockingStabilityInput): RockingStabilityResult {
  const h = requireNonNegative('cgHeightM', input.cgHeightM);
  const d = requirePositive('staticDeflectionM', input.staticDeflectionM);
  const a = requirePositive('halfSpacingX', input.halfSpacingX);
  const b = requirePositive('halfSpacingY', input.halfSpacingY);
  const hd = h * d;
  return {
    heightTimesDeflection: hd,
    marginPitch: hd === 0 ? Number.MAX_VALUE : (a * a) / hd,
    marginRoll: hd === 0 ? Number.MAX_VALUE : (b * b) / hd,
    stable: hd < a * a && hd < b * b,
  };
}
