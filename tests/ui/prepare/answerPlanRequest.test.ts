import { describe, expect, it } from 'vitest';
import { findCompound, molesFromAmounts } from '../../../src/science/index.ts';
import { createPlanAnswerer } from '../../../src/ui/prepare/answerPlanRequest.ts';
import type { PlanRequest, PlanResult } from '../../../src/ui/prepare/planRequest.ts';
import { publishedAzeotropes } from '../../fixtures/azeotropes.ts';
import { boilingPoints } from '../../fixtures/boilingPoints.ts';

function requestFor(names: string[], ml: number[], pressurePa = 101325, plates = 4): PlanRequest {
  const compounds = names.map((n) => findCompound(n));
  const moles = molesFromAmounts(compounds, ml.map((v) => v * 1e-6), 'volume');
  const chargeMol = moles.reduce((a, b) => a + b, 0);
  return { compounds: names.map((name) => ({ kind: 'library', name })), x: moles.map((n) => n / chargeMol), chargeMol, pressurePa, plates, heatSourceMaxK: null, windows: null };
}

function answer(request: PlanRequest, answerer = createPlanAnswerer()): PlanResult {
  const reply = answerer({ id: 7, request });
  if (!reply.ok) throw new Error(reply.message);
  expect(reply.id).toBe(7);
  return reply.result;
}

describe('createPlanAnswerer (the planning worker, called directly)', () => {
  it('gives boiling points at 1 atm within 0.5 K of Yaws (2014) for n-hexane and toluene', () => {
    const result = answer(requestFor(['n-hexane', 'toluene'], [40, 60]));
    for (const name of ['n-hexane', 'toluene']) {
      // Yaws, Thermophysical Properties of Chemicals and Hydrocarbons (2014), via tests/fixtures/boilingPoints.ts
      const yawsK = boilingPoints.find((b) => b.name === name)!.yawsK!;
      expect(result.boilingPoints.find((b) => b.name === name)!.tC + 273.15).toBeCloseTo(yawsK, 0);
    }
    expect(result.model).toBe('unifac');
    expect(result.binary?.x.length).toBe(51);
    expect(result.azeotropes[0]!.status).toBe('none');
  });

  it('finds the ethanol-water azeotrope near the published 78.2 degC and 0.894 mole fraction ethanol', () => {
    const result = answer(requestFor(['ethanol', 'water'], [50, 50]));
    const published = publishedAzeotropes.find((a) => a.first === 'ethanol' && a.second === 'water')!; // CRC / Horsley (from memory)
    const found = result.azeotropes[0]!.azeotropes[0]!;
    expect(found.kind).toBe(published.kind);
    expect(Math.abs(found.tK - 273.15 - published.tC)).toBeLessThan(1.5);
    expect(Math.abs(found.x1 - published.x1)).toBeLessThan(0.05);
    expect(result.advice.some((a) => /azeotrope/.test(a.text))).toBe(true);
  });

  it('advises on Prepare that a component the column cannot bring over 90 % pure comes in mixed fractions', () => {
    // Benzene/toluene with no plates: the first vapour from an equimolar pot is about 70 % benzene
    // at total reflux (alpha about 2.4-2.6, Fenske relation with one stage; tests/science/plan/cutPlan.test.ts).
    const result = answer(requestFor(['benzene', 'toluene'], [50, 50], 101325, 0));
    expect(result.advice.some((a) => /benzene never comes over 90 % pure/.test(a.text))).toBe(true);
    const tall = answer(requestFor(['benzene', 'toluene'], [50, 50], 101325, 6));
    expect(tall.advice.some((a) => /never comes over 90 % pure/.test(a.text))).toBe(false);
  });

  it('falls back to Raoult for a compound of the chemist\'s own and calls the pair unknown, never "none"', () => {
    const request = requestFor(['toluene'], [50]);
    request.compounds.push({ kind: 'user', input: { name: 'my ester', normalBoilingPointK: 420, molarMassKgPerMol: 0.13, liquidDensityKgPerM3: 880 } });
    request.x = [0.5, 0.5];
    const result = answer(request);
    expect(result.model).toBe('ideal');
    expect(result.modelNote).toMatch(/Raoult/);
    expect(result.azeotropes[0]!.status).toBe('unknown');
    expect(result.boilingPoints.find((b) => b.name === 'my ester')!.isEstimated).toBe(true);
    expect(result.advice.some((a) => /unknown/.test(a.text))).toBe(true);
  });

  it('plans windows that never overlap, and receivers plus pot account for the whole charge', () => {
    const request = requestFor(['n-hexane', 'toluene'], [40, 60]);
    const result = answer(request);
    const w = result.plan.windows;
    for (let i = 1; i < w.length; i++) expect(w[i]!.fromC).toBeGreaterThanOrEqual(w[i - 1]!.toC);
    const collected = result.receivers.reduce((s, r) => s + r.moleShare, 0);
    expect(collected + result.potLeftShare).toBeCloseTo(1, 9);
    // Volumes add up (ideal mixing): distillate volumes plus what stays are near the 100 mL charged.
    const distilledMl = result.headCurve.distilledMl!.at(-1)!;
    expect(result.receivers.reduce((s, r) => s + r.volumeMl!, 0)).toBeCloseTo(distilledMl, 6);
    expect(distilledMl).toBeGreaterThan(80);
    expect(distilledMl).toBeLessThan(100);
    expect(result.receivers[0]!.purityOf).toBe('n-hexane');
    expect(result.receivers[0]!.purity!).toBeGreaterThan(0.9);
  });

  it('an edited window moves volume between receivers and keeps the edit in the plan', () => {
    const answerer = createPlanAnswerer();
    const request = requestFor(['n-hexane', 'toluene'], [40, 60]);
    const planned = answer(request, answerer);
    const windows = planned.plan.windows.map((w) => ({ ...w }));
    // Change to receiver 2 well before the hexane plateau ends: receiver 1 holds less.
    windows[0]!.toC = windows[0]!.fromC + 0.3;
    windows[1]!.fromC = windows[0]!.toC;
    const edited = answer({ ...request, windows }, answerer);
    expect(edited.plan.windows[0]!.toC).toBeCloseTo(windows[0]!.toC, 9);
    expect(edited.receivers[0]!.volumeMl!).toBeLessThan(planned.receivers[0]!.volumeMl! - 1);
    expect(edited.plannedWindows).toEqual(planned.plannedWindows);
  });

  it.each([
    ['an empty charge', (r: PlanRequest) => ({ ...r, compounds: [], x: [] }), /empty/],
    ['a pressure of zero', (r: PlanRequest) => ({ ...r, pressurePa: 0 }), /above zero/],
    ['an unknown compound', (r: PlanRequest) => ({ ...r, compounds: [{ kind: 'library' as const, name: 'unobtainium' }, r.compounds[1]!] }), /unknown compound "unobtainium"/],
    ['NaN moles', (r: PlanRequest) => ({ ...r, chargeMol: Number.NaN }), /more than nothing/],
  ])('answers %s with a message, not a throw', (_label, change, message) => {
    const reply = createPlanAnswerer()({ id: 1, request: change(requestFor(['n-hexane', 'toluene'], [40, 60])) });
    expect(reply.ok).toBe(false);
    if (!reply.ok) expect(reply.message).toMatch(message);
  });

  it('does not change the request it is given', () => {
    const request = requestFor(['n-hexane', 'toluene'], [40, 60]);
    const copy = structuredClone(request);
    answer(request);
    expect(request).toEqual(copy);
  });
});
