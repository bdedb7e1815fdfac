import type { DesignInput } from '../selection/dto/design-input.dto.js';

/**
 * The starting point of a new design when the client sends no input: one placeholder machine
 * on four corner points, a 4-pole motor speed on a 50 Hz supply, and the common-practice
 * criteria (90 % isolation, utilisation 0.5–1.0). The engineer replaces every value.
 */
export function defaultDesignInput(): DesignInput {
  return {
    components: [{ name: 'Machine', massKg: 1000, cg: { x: 0, y: 0, z: 0.4 } }],
    mountPoints: [
      { label: 'A', x: 0.8, y: 0.45, z: 0 },
      { label: 'B', x: 0.8, y: -0.45, z: 0 },
      { label: 'C', x: -0.8, y: 0.45, z: 0 },
      { label: 'D', x: -0.8, y: -0.45, z: 0 },
    ],
    operating: { speedRpm: 1480, orders: [1, 2], lineFrequencyHz: 50 },
    criteria: { minIsolationPct: 90, minUtilization: 0.5, maxUtilization: 1.0 },
  };
}
