import { describe, expect, it } from 'vitest';
import { findCompound } from '../../../src/science/compounds/index.ts';
import { planCuts } from '../../../src/science/plan/cutPlan.ts';
import { perryDippr101 } from '../../fixtures/perryDippr101.ts';

const hexTol = { compounds: [findCompound('n-hexane'), findCompound('toluene')], x: [0.4, 0.6], chargeMol: 0.5, pPa: 101325, model: 'unifac' as const };

describe('planCuts', () => {
  it('plans hexane, an intermediate cut and toluene with windows near their boiling points (CRC: 68.7 and 110.6 degC)', () => {
    const plan = planCuts({ ...hexTol, plates: 5 });
    const main = plan.fractions.filter((f) => f.compound !== null);
    expect(main.map((f) => f.compound)).toEqual(['n-hexane', 'toluene']);
    expect(main[0]!.fromTK - 273.15).toBeGreaterThan(67);
    expect(main[0]!.toTK - 273.15).toBeLessThan(75);
    expect(Math.abs(main[1]!.toTK - 273.15 - 110.6)).toBeLessThanOrEqual(1); // includes the 0.5 degC allowance
    const receivers = plan.fractions.map((f) => f.receiver);
    expect(receivers).toEqual(receivers.map((_, i) => i + 1));
    const between = plan.fractions[plan.fractions.indexOf(main[0]!) + 1]!;
    expect(between.compound).toBeNull();
    expect(between.fromTK).toBeCloseTo(main[0]!.toTK, 9);
    expect(between.toTK).toBeCloseTo(main[1]!.fromTK, 9);
  });
  it('collects about 90 % of the charge (never to dryness) and the volumes add up', () => {
    const plan = planCuts({ ...hexTol, plates: 5 });
    const charge = 0.5 * (0.4 * 0.08618 / 659 + 0.6 * 0.09214 / 866.9);
    const collected = plan.fractions.reduce((s, f) => s + f.volumeM3, 0);
    expect(collected / charge).toBeGreaterThan(0.85);
    expect(collected / charge).toBeLessThan(0.95);
  });
  it('more plates give purer main cuts: the hexane cut narrows', () => {
    const few = planCuts({ ...hexTol, plates: 2 }).fractions.find((f) => f.compound === 'n-hexane')!;
    const many = planCuts({ ...hexTol, plates: 20 }).fractions.find((f) => f.compound === 'n-hexane')!;
    expect(many.toTK - many.fromTK).toBeLessThanOrEqual(few.toTK - few.fromTK);
    expect(many.composition['n-hexane']!).toBeGreaterThan(few.composition['n-hexane']!);
  });
  it('ethanol/water: reports the azeotrope and no pure ethanol cut', () => {
    const plan = planCuts({ compounds: [findCompound('ethanol'), findCompound('water')], x: [0.3, 0.7], chargeMol: 2, pPa: 101325, plates: 10, model: 'unifac' });
    expect(plan.fractions.some((f) => f.compound === 'ethanol')).toBe(false);
    expect(plan.advice.some((a) => /azeotrope/.test(a.text))).toBe(true);
    expect(plan.azeotropes[0]!.status).toBe('azeotrope');
  });
  it('gives the usual cautions: peroxides for THF, never to dryness, autoignition against the heat source', () => {
    const plan = planCuts({ compounds: [findCompound('THF'), findCompound('toluene')], x: [0.5, 0.5], chargeMol: 0.5, pPa: 101325, plates: 3, model: 'ideal', heatSourceMaxK: 350 + 273.15 });
    const texts = plan.advice.map((a) => a.text).join('\n');
    expect(texts).toMatch(/tetrahydrofuran can hold peroxides/);
    expect(texts).toMatch(/never distil to dryness/);
    expect(texts).toMatch(/heat source is hotter than the autoignition temperature of tetrahydrofuran/);
    for (const a of plan.advice) expect(a.basis.length).toBeGreaterThan(0);
  });
  it('advises reduced pressure for high boilers and simple distillation for far-apart boiling points (common practice)', () => {
    const plan = planCuts({ compounds: [findCompound('acetone'), findCompound('DMSO')], x: [0.5, 0.5], chargeMol: 0.5, pPa: 101325, plates: 0, model: 'ideal' });
    const texts = plan.advice.map((a) => a.text).join('\n');
    expect(texts).toMatch(/reduced pressure/);
    expect(texts).toMatch(/simple distillation separates them/);
  });
  it('reports the relative volatility across the run and Fenske stages', () => {
    const plan = planCuts({ compounds: [findCompound('benzene'), findCompound('toluene')], x: [0.5, 0.5], chargeMol: 0.5, pPa: 101325, plates: 5, model: 'ideal' });
    expect(plan.relativeVolatilities[0]!.atStart).toBeGreaterThan(2.3);
    // alpha falls as the pot grows hotter and leaner in benzene
    expect(plan.relativeVolatilities[0]!.atEnd).toBeLessThan(plan.relativeVolatilities[0]!.atStart);
    expect(plan.minimumStages[0]).toBeGreaterThan(5.5);
    expect(plan.minimumStages[0]).toBeLessThan(7.5);
  });
  it('says which components a column can bring over 90 % pure, as the Fenske total-reflux relation does (benzene/toluene)', () => {
    // At total reflux the head's first vapour from a pot of x_B benzene satisfies
    // y_B / (1 - y_B) = alpha^(plates + 1) x_B / (1 - x_B) (Fenske, 1932; the pot is a stage).
    // alpha is Raoult's-law p_B/p_T from the DIPPR-101 vapour pressures (Perry's 8th ed.,
    // Table 2-8) at 365 K, near the equimolar bubble point.
    const psat = (name: string, tK: number): number => {
      const c = perryDippr101.find((p) => p.name === name)!;
      return Math.exp(c.c1 + c.c2 / tK + c.c3 * Math.log(tK) + c.c4 * tK ** c.c5);
    };
    const alpha = psat('benzene', 365) / psat('toluene', 365);
    const firstHead = (plates: number): number => {
      const ratio = alpha ** (plates + 1);
      return ratio / (1 + ratio);
    };
    const benzeneBand = (plates: number) => planCuts({ compounds: [findCompound('benzene'), findCompound('toluene')], x: [0.5, 0.5], chargeMol: 0.5, pPa: 101325, plates, model: 'ideal' })
      .expectedPlateaus.find((b) => b.label === 'benzene')!;
    expect(firstHead(0)).toBeLessThan(0.75);
    expect(benzeneBand(0).reachesPurity).toBe(false);
    expect(firstHead(1)).toBeLessThan(0.88);
    expect(benzeneBand(1).reachesPurity).toBe(false);
    expect(firstHead(2)).toBeGreaterThan(0.93);
    expect(benzeneBand(2).reachesPurity).toBe(true);
  });
  it('advises that a component the column cannot bring to purity comes in mixed fractions, before the cautions', () => {
    const plan = planCuts({ compounds: [findCompound('benzene'), findCompound('toluene')], x: [0.5, 0.5], chargeMol: 0.5, pPa: 101325, plates: 0, model: 'ideal' });
    const index = plan.advice.findIndex((a) => /benzene never comes over 90 % pure/.test(a.text));
    expect(index).toBeGreaterThanOrEqual(0);
    expect(plan.advice[index]!.kind).toBe('method');
    expect(plan.advice.slice(0, index).every((a) => a.kind === 'method')).toBe(true);
    const tall = planCuts({ compounds: [findCompound('benzene'), findCompound('toluene')], x: [0.5, 0.5], chargeMol: 0.5, pPa: 101325, plates: 4, model: 'ideal' });
    expect(tall.advice.some((a) => /never comes over 90 % pure/.test(a.text))).toBe(false);
  });
  it.each([
    { chargeMol: 0 }, { pPa: 0 }, { plates: -1 }, { x: [1] }, { targetPurity: 1.5 },
  ])('planCuts refuses bad input %j', (bad) => {
    expect(() => planCuts({ ...hexTol, plates: 5, ...bad })).toThrow(RangeError);
  });
});
