import { describe, expect, it } from 'vitest';
import {
  DESIGN_STATE_LABELS,
  MOUNT_TYPE_LABELS,
  designStateWords,
  fieldName,
  fieldPlace,
  fieldWords,
  formatMoney,
  formatUtilisation,
  identifiersIn,
  inputProblemWords,
  mountTypeLabel,
} from './glossary.js';
import { CAUTIONS, GENERAL_CAUTION, cautionLines, cautionsFor } from './cautions.js';

describe('glossary', () => {
  it('names the check step "check" in every state label', () => {
    expect(DESIGN_STATE_LABELS.in_review).toBe('In check');
    expect(designStateWords('in_review')).toBe('in check');
    expect(Object.values(DESIGN_STATE_LABELS).join(' ')).not.toMatch(/review/i);
  });

  it('gives every label in words, without codes', () => {
    for (const label of [...Object.values(DESIGN_STATE_LABELS), ...Object.values(MOUNT_TYPE_LABELS)]) {
      expect(identifiersIn(label)).toEqual([]);
    }
    expect(mountTypeLabel('open_spring')).toBe('Open spring');
    expect(mountTypeLabel('future_kind')).toBe('future kind');
    expect(designStateWords('on_hold')).toBe('on hold');
  });

  it('reads property names as words: known ones from the list, others by splitting and dropping the unit', () => {
    expect(fieldWords('massKg')).toBe('Mass');
    expect(fieldWords('altMassKg')).toBe('Second mass');
    expect(fieldWords('supportStiffnessNPerMm')).toBe('Support stiffness');
    expect(fieldWords('lineFrequencyHz')).toBe('Supply frequency');
    expect(fieldWords('contactEmail')).toBe('Contact email');
    expect(fieldWords('staticDeflectionMm')).toBe('Static deflection');
    expect(fieldWords('part_number')).toBe('Part number');
    expect(fieldWords('x')).toBe('x');
  });

  it('reads a field path as a name and a place in a list', () => {
    expect(fieldName('components.0.massKg')).toBe('Mass');
    expect(fieldPlace('components.0.massKg')).toBe('component 1');
    expect(fieldPlace('input.mountPoints.2.x')).toBe('mount point 3');
    expect(fieldName('input.mountPoints.2.x')).toBe('x');
    expect(fieldPlace('components[Motor].massKg')).toBe('component Motor');
    expect(fieldPlace('operating.extraFrequenciesHz.1')).toBe('further frequency 2');
    expect(fieldName('operating.extraFrequenciesHz.1')).toBe('Further frequencies');
    expect(fieldPlace('operating.speedRpm')).toBe('');
    expect(fieldName('operating.speedRpm')).toBe('Speed');
  });

  it('reads a calculation refusal in words', () => {
    expect(inputProblemWords('massKg', 'massKg: must be a finite number > 0')).toBe('Mass must be a finite number > 0');
    expect(inputProblemWords('points', 'points: mounts are collinear (or coincide): the frame would tip')).toBe(
      'Mounts are collinear (or coincide): the frame would tip',
    );
    expect(inputProblemWords('points[2].x', 'points[2].x: must be a finite number')).toBe('X must be a finite number');
  });

  it('formats money one way: code, thousands, two decimals', () => {
    expect(formatMoney(1240.5, 'USD')).toBe('USD 1,240.50');
    expect(formatMoney(1240, 'EUR')).toBe('EUR 1,240.00');
    expect(formatMoney(1234567.891, 'USD')).toBe('USD 1,234,567.89');
    expect(formatMoney(-12.5, 'GBP')).toBe('-GBP 12.50');
    expect(formatMoney(0, 'USD')).toBe('USD 0.00');
  });

  it('shows utilisation as a percentage', () => {
    expect(formatUtilisation(0.734)).toBe('73 %');
    expect(formatUtilisation(1.07)).toBe('107 %');
    expect(formatUtilisation(0.7345, 1)).toBe('73.5 %');
  });

  it('finds identifiers: camel case, snake-case codes, indexed paths — and leaves words and units alone', () => {
    expect(identifiersIn('massKg must be a positive number')).toEqual(['massKg']);
    expect(identifiersIn('Mount type open_spring is not among the allowed types')).toEqual(['open_spring']);
    expect(identifiersIn('from in_review to draft')).toEqual(['in_review']);
    expect(identifiersIn('components[0] is wrong')).toEqual(['components[0]']);
    expect(identifiersIn('Input › mount points › 2 › x: input.mountPoints.2.x')).toEqual(['mountPoints']);
    expect(identifiersIn('Mass must be a positive number; 12 kN, 40 dB, 3.5 kPa, 1,480 rpm, 25 Hz')).toEqual([]);
  });
});

describe('cautions', () => {
  it('a design gets the general, speed-range and supplier-ratings cautions, and the seismic one when it asks for restraint', () => {
    expect(cautionsFor('design').map((c) => c.id)).toEqual(['general', 'speed-range', 'supplier-ratings']);
    expect(cautionsFor('design', { restraint: true }).map((c) => c.id)).toEqual([
      'general',
      'speed-range',
      'supplier-ratings',
      'seismic-restraint',
    ]);
  });

  it('a supplier gets the general caution and the ratings to confirm', () => {
    expect(cautionsFor('supplier').map((c) => c.id)).toEqual(['general', 'supplier-ratings']);
    const lines = cautionLines('supplier');
    expect(lines[0]).toContain(GENERAL_CAUTION);
    expect(lines[1]).toMatch(/confirmed with the supplier before purchase/);
  });

  it('say what PRODUCT.md asks: licensed engineer, local codes, the code edition, no anchorage sizing', () => {
    expect(CAUTIONS.general.text).toMatch(/licensed engineer/);
    expect(CAUTIONS.general.text).toMatch(/local codes/);
    expect(CAUTIONS['seismic-restraint'].text).toMatch(/ASCE 7-16/);
    expect(CAUTIONS['seismic-restraint'].text).toMatch(/does not size anchorage/);
    expect(CAUTIONS['speed-range'].text).toMatch(/reciprocating engines are outside the model/);
    for (const caution of Object.values(CAUTIONS)) expect(identifiersIn(`${caution.title} ${caution.text}`)).toEqual([]);
  });
});
