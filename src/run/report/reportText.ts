import { figuresFor, type Figures } from '../../science/units/index.ts';
import type { RunRecord } from '../runRecord.ts';
import type { RunReport } from './buildRunReport.ts';
import { plateMethod, type PlateEstimate } from './runPlates.ts';
import { runTimeline } from './runTimeline.ts';

/** Seconds as h:mm:ss (or m:ss under an hour). */
export function clockTime(seconds: number): string {
  const s = Math.max(0, Math.round(seconds));
  const h = Math.floor(s / 3600);
  const m = Math.floor((s % 3600) / 60);
  const rest = String(s % 60).padStart(2, '0');
  return h > 0 ? `${h}:${String(m).padStart(2, '0')}:${rest}` : `${m}:${rest}`;
}

/** Composition in words: "ethyl acetate 97.0 %, n-butyl acetate 3.0 % (mol)". */
export function compositionWords(names: readonly string[], fractions: readonly number[] | null | undefined, basis: string, figures: Figures = figuresFor()): string {
  if (!fractions) return '—';
  return `${names.map((n, i) => `${n} ${figures.percent(fractions[i])}`).join(', ')} (${basis})`;
}

/** The charge as written: "ethyl acetate 30 mL, n-butyl acetate 30 mL". */
export function chargeWords(run: Pick<RunRecord, 'charge'>, figures: Figures = figuresFor()): string {
  return run.charge.map((c) => `${c.name} ${String(c.amount).replace('.', figures.style.decimalMark)} ${c.unit}`).join(', ') || 'not recorded';
}

/** The alarm thresholds the run was watched with, or null for a record without them. */
export function alarmSettingsWords(run: Pick<RunRecord, 'alarm_settings'>, figures: Figures = figuresFor()): string | null {
  const a = run.alarm_settings;
  if (!a) return null;
  const minutes = Math.round(a.no_vapour_s / 60);
  return `cut at ${figures.temperatureDifference(a.breakthrough_rise_c)} above a plateau; stall at ${figures.temperatureDifference(a.fall_away_c)} below it, or no vapour after ${minutes} min; sensor alarm after ${figures.number(a.sensor_silence_s, 0)} s without readings`;
}

/** The column as written, with the plates planned. */
export function columnWords(run: Pick<RunRecord, 'column'>): string {
  return run.column ? `${run.column.description}${run.column.theoretical_plates != null ? `, ${run.column.theoretical_plates} plates planned` : ''}` : 'not recorded';
}

/** "3.2 theoretical plates (4.2 stages with the pot), from receiver 1: xD 0.970, xW 0.310, α 2.40; HETP 7.8 cm". */
export function plateWords(p: PlateEstimate, figures: Figures = figuresFor()): string {
  const n = figures.number;
  const hetp = p.hetpM !== null ? `; HETP ${n(p.hetpM * 100, 1)} cm` : '';
  return `${n(p.plates, 1)} theoretical plates (${n(p.stages, 1)} stages with the pot), from receiver ${p.receiver}: xD ${n(p.distillateLight, 3)}, xW ${n(p.potLight, 3)}, α ${n(p.alpha, 2)}${hetp}`;
}

/**
 * The report as plain text a chemist can paste into a lab notebook or share, with figures in
 * the reader's units (degC, kPa and a decimal point unless told otherwise).
 */
export function reportText(run: RunRecord, report: RunReport, figures: Figures = figuresFor()): string {
  const { percent, grams, millilitres } = figures;
  const degrees = (c: number) => figures.temperature(c);
  const lines: string[] = [];
  lines.push(`${run.title}`, `Run ${run.id}, started ${run.started_at}${run.ended_at ? `, ended ${run.ended_at}` : ''}`);
  lines.push(`Charge: ${chargeWords(run, figures)}`);
  lines.push(`Pressure: ${figures.pressure(report.pressurePa)}${run.pressure_pa == null ? ' (assumed)' : ''}`);
  lines.push(`Column: ${columnWords(run)}`);
  lines.push(`Source: ${run.source.label}`);
  const alarms = alarmSettingsWords(run, figures);
  if (alarms) lines.push(`Alarms: ${alarms}`);
  lines.push(`Heat: ${run.heat_changes.length === 0 ? 'no changes recorded' : run.heat_changes.map((h) => `${clockTime(h.time_s)} ${h.text}`).join('; ')}`);
  lines.push('', 'Timeline:');
  for (const e of runTimeline(run)) lines.push(`  ${clockTime(e.timeS)}  ${e.kind}: ${e.text}${e.headC != null ? ` at ${degrees(e.headC)}` : ''}`);
  lines.push('', 'Fractions:');
  for (const r of report.rows) {
    lines.push(`  Receiver ${r.receiver}: ${degrees(r.minHeadC)} to ${degrees(r.maxHeadC)}, ${clockTime(r.fromS)} to ${clockTime(r.toS)}; ${millilitres(r.volumeM3)}, ${grams(r.massKg)}`);
    if (r.measured) lines.push(`    analysis: ${compositionWords(report.components, r.measured.mass, 'mass', figures)}; ${r.measuredBy}`);
    if (r.estimated) lines.push(`    from head temperature: ${compositionWords(report.components, r.estimated.mass, 'mass', figures)}`);
    if (r.mainComponent) lines.push(`    purity: ${r.mainComponent} ${percent(r.purityMass)} by mass (${r.purityBasis})`);
    for (const w of r.warnings) lines.push(`    note: ${w}`);
  }
  lines.push(`  ${report.estimateMethod}`);
  if (report.recovery) {
    lines.push('', `Recovery${report.isRecoveryEstimated ? ' (partly from head-temperature estimates)' : ''}:`);
    for (const c of report.recovery) lines.push(`  ${c.name}: ${grams(c.recoveredKg)} of ${grams(c.chargedKg)} charged, ${percent(c.recovery)}; in its own cuts ${percent(c.ownCutsRecovery)}`);
  }
  if (report.balance) {
    const b = report.balance;
    lines.push('', `Mass balance: charged ${grams(b.chargedKg)}; fractions ${grams(b.fractionsKg)}; residue ${grams(b.residueKg)}; losses ${grams(b.lossesKg)}; unaccounted ${grams(b.unaccountedKg)} (${percent(b.unaccountedFraction)})`);
  }
  lines.push('');
  if ('reason' in report.plates) lines.push(`Plates: not estimated (${report.plates.reason})`);
  else {
    const p = report.plates;
    lines.push(`Plates: ${plateWords(p, figures)}`);
    lines.push(`  Method: ${plateMethod}`);
  }
  if (report.problems.length > 0) lines.push('', ...report.problems.map((p) => `Note: ${p}`));
  for (const n of run.notes) lines.push(`Note at ${clockTime(n.time_s)}: ${n.text}`);
  return `${lines.join('\n')}\n`;
}
