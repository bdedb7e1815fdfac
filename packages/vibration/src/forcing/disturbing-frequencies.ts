import { requirePositive } from '../errors/validate.js';
import { VibrationInputError } from '../errors/vibration-input-error.js';

/** Where a disturbing frequency comes from. */
export type DisturbingSource = 'shaft' | 'vane-pass' | 'blade-pass' | 'electrical';

/** One steady forcing frequency of a machine. */
export interface DisturbingFrequency {
  /** Frequency [Hz]. */
  frequencyHz: number;
  /** Human-readable origin, e.g. "1× shaft at 1480 rpm". */
  label: string;
  /** Kind of source. */
  source: DisturbingSource;
  /** Multiple of the base frequency of the source (shaft order, pass harmonic, 2 for 2× line). */
  order: number;
  /** Shaft speed it was evaluated at [rpm]; absent for a fixed supply frequency. */
  speedRpm?: number;
}

/** Machine data for {@link disturbingFrequencies}. Give `speedRpm` or `speedRangeRpm`. */
export interface MachineForcingData {
  /** Constant operating speed [rpm]. */
  speedRpm?: number;
  /** Operating speed range of a variable-speed machine [rpm]; the minimum speed governs. */
  speedRangeRpm?: { min: number; max: number };
  /** Number of speeds evaluated across the range, ends included (default 2: min and max). */
  sweepPoints?: number;
  /** Shaft orders to include (default [1, 2]: unbalance and misalignment). */
  orders?: readonly number[];
  /** Number of pump impeller vanes → vane pass frequency Z·N/60. */
  vaneCount?: number;
  /** Number of fan blades → blade pass frequency Z·N/60. */
  bladeCount?: number;
  /** Harmonics of vane/blade pass to include (default [1]). */
  passHarmonics?: readonly number[];
  /** Supply (line) frequency [Hz], e.g. 50 or 60 → motor electromagnetic forcing at 2× line. */
  lineFrequencyHz?: number;
  /**
   * Motor pole count when the motor runs on a variable-speed drive: the electromagnetic forcing is
   * then 2× the drive output frequency p·N/120 (slip neglected) at every evaluated speed, instead
   * of 2× line.
   */
  motorPoles?: number;
}

function formatRpm(rpm: number): string {
  const rounded = Math.round(rpm * 10) / 10;
  return Number.isInteger(rounded) ? rounded.toFixed(0) : rounded.toFixed(1);
}

function formatHz(hz: number): string {
  return Number.isInteger(hz) ? hz.toFixed(0) : String(Math.round(hz * 100) / 100);
}

function ordinal(order: number): string {
  return `${Number.isInteger(order) ? order.toFixed(0) : String(order)}×`;
}

function requireOrders(field: string, values: readonly number[]): void {
  values.forEach((v, i) => requirePositive(`${field}[${i}]`, v));
}

function requireCount(field: string, value: number): number {
  requirePositive(field, value);
  if (!Number.isInteger(value)) throw new VibrationInputError(field, `must be a whole number (got ${value})`);
  return value;
}

/**
 * Steady disturbing frequencies of a machine, sorted ascending so that the first entry is the
 * governing (lowest) one: shaft orders n·N/60, vane or blade pass Z·N/60 (and harmonics), and the
 * motor's electromagnetic forcing at 2× line frequency (or 2× drive output with a variable-speed
 * drive). For a speed range every source is evaluated at the minimum and maximum speed (and at
 * `sweepPoints` speeds in all), since neither end is automatically the worst.
 * @param machine speeds [rpm], counts, line frequency [Hz]
 * @returns frequencies [Hz] with labels, lowest first
 */
export function disturbingFrequencies(machine: MachineForcingData): DisturbingFrequency[] {
  const speeds: { rpm: number; note: string }[] = [];
  if (machine.speedRpm !== undefined && machine.speedRangeRpm !== undefined) {
    throw new VibrationInputError('speedRpm', 'give either a constant speed or a speed range, not both');
  }
  if (machine.speedRpm !== undefined) {
    speeds.push({ rpm: requirePositive('speedRpm', machine.speedRpm), note: '' });
  } else if (machine.speedRangeRpm !== undefined) {
    const min = requirePositive('speedRangeRpm.min', machine.speedRangeRpm.min);
    const max = requirePositive('speedRangeRpm.max', machine.speedRangeRpm.max);
    if (max < min) throw new VibrationInputError('speedRangeRpm.max', 'must not be below the minimum speed');
    const points = machine.sweepPoints === undefined ? 2 : requireCount('sweepPoints', machine.sweepPoints);
    if (min === max || points === 1) {
      speeds.push({ rpm: min, note: min === max ? '' : ' (minimum speed)' });
    } else {
      if (points < 2) throw new VibrationInputError('sweepPoints', 'must be at least 1');
      for (let i = 0; i < points; i++) {
        const rpm = i === points - 1 ? max : min + ((max - min) * i) / (points - 1);
        const note = i === 0 ? ' (minimum speed)' : i === points - 1 ? ' (maximum speed)' : '';
        speeds.push({ rpm, note });
      }
    }
  }

  const orders = machine.orders ?? [1, 2];
  requireOrders('orders', orders);
  const harmonics = machine.passHarmonics ?? [1];
  requireOrders('passHarmonics', harmonics);
  const vanes = machine.vaneCount === undefined ? undefined : requireCount('vaneCount', machine.vaneCount);
  const blades = machine.bladeCount === undefined ? undefined : requireCount('bladeCount', machine.bladeCount);
  const line = machine.lineFrequencyHz === undefined ? undefined : requirePositive('lineFrequencyHz', machine.lineFrequencyHz);
  const poles = machine.motorPoles === undefined ? undefined : requireCount('motorPoles', machine.motorPoles);
  if (poles !== undefined && poles % 2 !== 0) throw new VibrationInputError('motorPoles', 'must be even');

  const out: DisturbingFrequency[] = [];
  for (const { rpm, note } of speeds) {
    const shaftHz = rpm / 60;
    const at = `at ${formatRpm(rpm)} rpm${note}`;
    for (const n of orders) {
      out.push({ frequencyHz: n * shaftHz, label: `${ordinal(n)} shaft ${at}`, source: 'shaft', order: n, speedRpm: rpm });
    }
    for (const [count, source, noun] of [
      [vanes, 'vane-pass', 'vane'],
      [blades, 'blade-pass', 'blade'],
    ] as const) {
      if (count === undefined) continue;
      for (const h of harmonics) {
        const prefix = h === 1 ? '' : `${ordinal(h)} `;
        out.push({
          frequencyHz: h * count * shaftHz,
          label: `${prefix}${noun} pass (${count} ${noun}s) ${at}`,
          source,
          order: h,
          speedRpm: rpm,
        });
      }
    }
    if (poles !== undefined) {
      const driveHz = (poles * rpm) / 120;
      out.push({
        frequencyHz: 2 * driveHz,
        label: `2× drive output (${formatHz(driveHz)} Hz, ${poles}-pole motor) ${at}`,
        source: 'electrical',
        order: 2,
        speedRpm: rpm,
      });
    }
  }
  if (poles === undefined && line !== undefined) {
    out.push({ frequencyHz: 2 * line, label: `2× line (${formatHz(line)} Hz supply)`, source: 'electrical', order: 2 });
  }
  if (out.length === 0) {
    throw new VibrationInputError('machine', 'gives no disturbing frequency: set a speed or a supply frequency', 'empty');
  }
  return out.sort((a, b) => a.frequencyHz - b.frequencyHz);
}

/**
 * The governing (lowest) disturbing frequency of a list.
 * @param frequencies list from {@link disturbingFrequencies} (any order)
 * @returns the entry with the lowest frequency [Hz]
 */
export function governingFrequency(frequencies: readonly DisturbingFrequency[]): DisturbingFrequency {
  if (frequencies.length === 0) throw new VibrationInputError('frequencies', 'must not be empty', 'empty');
  let best = frequencies[0];
  for (const f of frequencies) if (f.frequencyHz < best.frequencyHz) best = f;
  return best;
}
