import { describe, expect, it } from 'vitest';
import { plainWoodError } from '../../src/lib/wood-words';
import { equilibriumMoistureContent, flatteningEstimate, parseInches } from '../../shared/wood/index';

const fail = (fn: () => unknown) => { try { fn(); } catch (e) { return e; } throw new Error('expected a failure'); };

describe('wood math errors in the words beside the box', () => {
  it('names the box and drops the code name and the echoed value', () => {
    const e = fail(() => equilibriumMoistureContent({ temperatureF: 300, relativeHumidityPercent: 40 }));
    const text = plainWoodError(e, { temperatureF: { label: 'Temperature', unit: '°F' } });
    expect(text).toMatch(/^Temperature must be between -?\d+ and \d+ °F\.$/);
    expect(text).not.toMatch(/temperatureF|got/);
  });

  it('passes a typed size message through as it is', () => {
    const e = fail(() => parseInches('two'));
    expect(plainWoodError(e, {})).toMatch(/is not a size we can read/);
  });

  it('falls back to a plain sentence for an input it has no words for, or a non-wood error', () => {
    const e = fail(() => flatteningEstimate({ thicknessIn: 2, widthIn: 20, lengthIn: 80, deviationIn: -1 }));
    expect(plainWoodError(e, {}, 'Enter the cup and twist in inches.')).toBe('Enter the cup and twist in inches.');
    expect(plainWoodError(new Error('boom'), {})).toBe('Those numbers could not be used.');
  });
});
