import { describe, expect, it } from 'vitest';
import { findCompound } from '../../../src/science/compounds/index.ts';
import { adviseDistillation } from '../../../src/science/plan/advice.ts';
import { figuresFor } from '../../../src/science/units/figures.ts';
import { boilingPoints } from '../../fixtures/boilingPoints.ts';

// Normal boiling points, CRC Handbook 95th ed. (tests/fixtures/boilingPoints.ts): acetone 329.23 K, toluene 383.75 K.
const crcK = (name: string) => boilingPoints.find((b) => b.name === name)!.crcK;
const boiling = [
  { compound: findCompound('acetone'), tK: crcK('acetone') },
  { compound: findCompound('toluene'), tK: crcK('toluene') },
];

describe('adviseDistillation in the reader\'s units', () => {
  it('writes the gap between boiling points in degC by default', () => {
    const texts = adviseDistillation(boiling, [], 3, [], []).map((a) => a.text).join('\n');
    // 383.75 - 329.23 = 54.52 K apart: a short column (common practice)
    expect(texts).toMatch(/boil 55 °C apart: a short column/);
  });

  it('writes the same gap as a difference in degF (x 1.8, no offset; NIST SP 811, B.8) and the autoignition limit on that scale', () => {
    const texts = adviseDistillation(boiling, [], 3, [], [], undefined, figuresFor({ temperature: 'degF', pressure: 'kPa', decimalMark: '.' })).map((a) => a.text).join('\n');
    // 54.52 K x 1.8 = 98.1 degF
    expect(texts).toMatch(/boil 98 °F apart/);
    expect(texts).toMatch(/autoignition temperature of \w+ \(about \d+ °F\)/);
    expect(texts).not.toMatch(/°C|degC/);
  });
});
