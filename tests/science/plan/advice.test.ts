import { describe, expect, it } from 'vitest';
import { findCompound } from '../../../src/science/compounds/index.ts';
import { adviseDistillation } from '../../../src/science/plan/advice.ts';
import { figuresFor } from '../../../src/science/units/figures.ts';

// Normal boiling points, CRC Handbook 95th ed. (from memory): acetone 56.05 degC, toluene 110.6 degC.
const boiling = [
  { compound: findCompound('acetone'), tK: 56.05 + 273.15 },
  { compound: findCompound('toluene'), tK: 110.6 + 273.15 },
];

describe('adviseDistillation in the reader\'s units', () => {
  it('writes the gap between boiling points in degC by default', () => {
    const texts = adviseDistillation(boiling, [], 3, []).map((a) => a.text).join('\n');
    // 110.6 - 56.05 = 54.55 degC apart: a short column (common practice)
    expect(texts).toMatch(/boil 55 °C apart: a short column/);
  });

  it('writes the same gap as a difference in degF (x 1.8, no offset; NIST SP 811, B.8) and the autoignition limit on that scale', () => {
    const texts = adviseDistillation(boiling, [], 3, [], undefined, figuresFor({ temperature: 'degF', pressure: 'kPa', decimalMark: '.' })).map((a) => a.text).join('\n');
    // 54.55 degC x 1.8 = 98.2 degF
    expect(texts).toMatch(/boil 98 °F apart/);
    expect(texts).toMatch(/autoignition temperature of \w+ \(about \d+ °F\)/);
    expect(texts).not.toMatch(/°C|degC/);
  });
});
