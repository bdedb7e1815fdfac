import { describe, expect, it } from '@jest/globals';
import { inReaderUnits, measure, wordsInReaderUnits } from './reader-words.js';

// 1 in = 25.4 mm and 1 lbf = 4.4482216152605 N exactly (NIST SP 811, Appendix B); °F = °C × 1.8 + 32.
describe('reader-words', () => {
  const note = `the remaining level error of ${measure('deflection', 0.0066)} is trimmed with shims`;

  it('writes a figure mark in metric units for a metric reader', () => {
    expect(inReaderUnits(note, 'SI')).toBe('the remaining level error of 6.6 mm is trimmed with shims');
    expect(inReaderUnits(`pull ${measure('force', 1779.2886461041999)}`, 'SI')).toBe('pull 1779 N');
    expect(inReaderUnits(`at ${measure('temperature', -40)}`, 'SI')).toBe('at -40 °C');
  });

  it('writes it in inches, lbf and °F for a US customary reader', () => {
    expect(inReaderUnits(note, 'US')).toBe('the remaining level error of 0.26 in is trimmed with shims');
    expect(inReaderUnits(`pull ${measure('force', 400 * 4.4482216152605)}`, 'US')).toBe('pull 400 lbf');
    expect(inReaderUnits(`at ${measure('temperature', 50)} and ${measure('position', 0.254)}`, 'US')).toBe('at 122 °F and 10 in');
  });

  it('keeps a stated precision and leaves text without marks, or with marks it does not know, alone', () => {
    expect(inReaderUnits(measure('deflection', 0.00663, 3), 'US')).toBe('0.261 in');
    // significant digits in the reader's unit: 0.00008 m = 0.08 mm = 0.0031 in (1 in = 25.4 mm, NIST SP 811)
    expect(measure('deflection', 0.00008, { significant: 2 })).toBe('\u27e6deflection:0.00008:s2\u27e7');
    expect(inReaderUnits(measure('deflection', 0.00008, { significant: 2 }), 'SI')).toBe('0.08 mm');
    expect(inReaderUnits(measure('deflection', 0.00008, { significant: 2 }), 'US')).toBe('0.0031 in');
    expect(inReaderUnits('plain 6.6 mm', 'US')).toBe('plain 6.6 mm');
    expect(inReaderUnits('\u27e6colour:1\u27e7 \u27e6force:abc\u27e7', 'US')).toBe('\u27e6colour:1\u27e7 \u27e6force:abc\u27e7');
  });

  it('renders every string of an answer, copying only what changes and never changing the original', () => {
    class Holder {
      constructor(readonly reasons: string[]) {}
      get count(): number {
        return this.reasons.length;
      }
    }
    const when = new Date(0);
    const answer = { when, untouched: { a: 'x', n: 1 }, candidates: [new Holder([note, 'no figure'])] };
    const rendered = wordsInReaderUnits(answer, 'US');
    expect(rendered.candidates[0].reasons).toEqual(['the remaining level error of 0.26 in is trimmed with shims', 'no figure']);
    expect(rendered.candidates[0]).toBeInstanceOf(Holder);
    expect(rendered.candidates[0].count).toBe(2);
    expect(rendered.untouched).toBe(answer.untouched);
    expect(rendered.when).toBe(when);
    expect(answer.candidates[0].reasons[0]).toBe(note);
    const plain = { a: ['b'] };
    expect(wordsInReaderUnits(plain, 'SI')).toBe(plain);
  });
});
