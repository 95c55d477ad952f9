import { describe, expect, it } from 'vitest';
import { buildRunReport, reportText } from '../../../src/run/report/index.ts';
import type { RunRecord } from '../../../src/run/index.ts';
import { findCompound } from '../../../src/science/index.ts';
import { demoRunRecord, type DemoTruth } from './demoRunRecord.ts';

const light = findCompound('ethyl acetate');
const heavy = findCompound('n-butyl acetate');
const grams = (lightMol: number, heavyMol: number) => 1000 * (lightMol * light.molarMassKgPerMol! + heavyMol * heavy.molarMassKgPerMol!);

/** The demo run with each receiver's true volume and a GC analysis made from its true make-up. */
function withFractions(): { record: RunRecord; truth: DemoTruth[]; residueG: number } {
  const { record, truth, residueMol } = demoRunRecord();
  const residueG = grams(...residueMol);
  record.fractions = {
    entries: truth.map((t) => {
      const lightG = 1000 * t.lightMol * light.molarMassKgPerMol!;
      const total = grams(t.lightMol, t.heavyMol);
      return {
        receiver: t.receiver,
        amount: { value: t.volumeMl, unit: 'mL' as const },
        analysis: { method: 'gc-area' as const, area_percent: { 'ethyl acetate': (100 * lightG) / total, 'butyl acetate': 100 - (100 * lightG) / total } },
      };
    }),
    residue: { value: residueG, unit: 'g' },
    losses: null,
    packed_height_m: 0.3,
  };
  return { record, truth, residueG };
}

describe('buildRunReport', () => {
  it('buildRunReport splits the demo run into its three receivers with their head ranges', () => {
    const report = buildRunReport(demoRunRecord().record);
    expect(report.rows.map((r) => r.receiver)).toEqual([1, 2, 3]);
    const [first, , last] = report.rows;
    // The first cut starts when vapour reaches the head, and ends where the receiver changed (80 degC).
    expect(first!.maxHeadC).toBeLessThanOrEqual(80.5);
    expect(last!.minHeadC).toBeGreaterThan(119);
    // Ethyl acetate 77.1 degC, n-butyl acetate 126.1 degC at 101.325 kPa (CRC Handbook 95th ed., normal boiling points).
    expect(last!.maxHeadC).toBeLessThan(126.5);
  });

  it('buildRunReport estimates each cut from its head temperatures: main cuts within 0.02 of the true make-up, the intermediate within 0.06', () => {
    const { record, truth } = demoRunRecord();
    const report = buildRunReport(record);
    report.rows.forEach((row, i) => {
      const t = truth[i]!;
      // The intermediate cut changes fast: a time average of dew-point inversions, with the head's
      // holdup between bulb and receiver, is only a rough guide there.
      const tolerance = row.receiver === 2 ? 0.06 : 0.02;
      expect(Math.abs(row.estimated!.mole[0]! - t.lightMol / (t.lightMol + t.heavyMol))).toBeLessThan(tolerance);
    });
  });

  it('buildRunReport closes the mass balance and recovers each component when every receiver is measured', () => {
    const { record, truth, residueG } = withFractions();
    const report = buildRunReport(record);
    // 30 mL of each at the library densities (g/mL = kg/m^3 / 1000).
    const chargeG = (30 * light.liquidDensityKgPerM3!) / 1000 + (30 * heavy.liquidDensityKgPerM3!) / 1000;
    expect(report.balance!.chargedKg * 1000).toBeCloseTo(chargeG, 6);
    expect(report.residueKg! * 1000).toBeCloseTo(residueG, 9);
    // Volumes convert to masses with ideal mixing, as the still distils them: nothing goes missing.
    expect(Math.abs(report.balance!.unaccountedFraction)).toBeLessThan(1e-3);
    const lightG = truth.reduce((s, t) => s + 1000 * t.lightMol * light.molarMassKgPerMol!, 0);
    expect(report.recovery![0]!.recoveredKg * 1000).toBeCloseTo(lightG, 1);
    expect(report.isRecoveryEstimated).toBe(false);
    expect(report.rows[0]!.purityBasis).toBe('analysis');
    expect(report.rows[0]!.mainComponent).toBe('ethyl acetate');
  });

  it('buildRunReport finds the demo column\'s plates by Fenske within one plate', () => {
    const report = buildRunReport(withFractions().record);
    // The simulated column has 4 theoretical stages above the pot at reflux 2; Fenske on the
    // fractions gives a minimum-stage figure a little below the stages at finite reflux.
    if ('reason' in report.plates) throw new Error(report.plates.reason);
    expect(report.plates.plates).toBeLessThanOrEqual(4.25);
    expect(report.plates.plates).toBeGreaterThan(2);
    expect(report.plates.hetpM).toBeCloseTo(0.3 / report.plates.plates, 12);
  });

  it('buildRunReport says why, rather than failing, for an unknown compound and a run without pressure', () => {
    const { record } = demoRunRecord();
    const odd = { ...record, charge: [{ name: 'unobtainium', amount: 10, unit: 'mL' as const }], pressure_pa: null };
    const report = buildRunReport(odd);
    expect(report.problems.join(' ')).toMatch(/unknown compound "unobtainium"/);
    expect(report.problems.join(' ')).toMatch(/101.325 kPa assumed/);
    expect(report.rows).toHaveLength(3);
    expect(report.balance).toBeNull();
  });

  it('reportText names the charge, pressure, fractions, recovery, mass balance and plates', () => {
    const { record } = withFractions();
    record.alarm_settings = { breakthrough_rise_c: 1, fall_away_c: 4, no_vapour_s: 1800, sensor_silence_s: 5 };
    const text = reportText(record, buildRunReport(record));
    expect(text).toContain('Alarms: cut at 1.0 °C above a plateau; stall at 4.0 °C below it, or no vapour after 30 min; sensor alarm after 5 s without readings');
    for (const part of ['Charge: ethyl acetate 30 mL', 'Pressure: 101.3 kPa', 'Receiver 3:', 'Recovery', 'Mass balance: charged', 'theoretical plates', 'HETP']) {
      expect(text).toContain(part);
    }
  });
});
