import type { RunRecord } from '../runRecord.ts';
import type { RunReport } from './buildRunReport.ts';
import { plateMethod } from './runPlates.ts';
import { runTimeline } from './runTimeline.ts';

/** Seconds as h:mm:ss (or m:ss under an hour). */
export function clockTime(seconds: number): string {
  const s = Math.max(0, Math.round(seconds));
  const h = Math.floor(s / 3600);
  const m = Math.floor((s % 3600) / 60);
  const rest = String(s % 60).padStart(2, '0');
  return h > 0 ? `${h}:${String(m).padStart(2, '0')}:${rest}` : `${m}:${rest}`;
}

const percent = (f: number | null | undefined) => (f == null || !Number.isFinite(f) ? '—' : `${(100 * f).toFixed(1)} %`);
const grams = (kg: number | null | undefined) => (kg == null || !Number.isFinite(kg) ? '—' : `${(kg * 1000).toFixed(2)} g`);
const millilitres = (m3: number | null | undefined) => (m3 == null || !Number.isFinite(m3) ? '—' : `${(m3 * 1e6).toFixed(1)} mL`);
const degrees = (c: number) => (Number.isFinite(c) ? `${c.toFixed(1)} °C` : '—');

/** Composition in words: "ethyl acetate 97.0 %, n-butyl acetate 3.0 % (mol)". */
export function compositionWords(names: readonly string[], fractions: readonly number[] | null | undefined, basis: string): string {
  if (!fractions) return '—';
  return `${names.map((n, i) => `${n} ${percent(fractions[i])}`).join(', ')} (${basis})`;
}

/** The report as plain text a chemist can paste into a lab notebook or share. */
export function reportText(run: RunRecord, report: RunReport): string {
  const lines: string[] = [];
  lines.push(`${run.title}`, `Run ${run.id}, started ${run.started_at}${run.ended_at ? `, ended ${run.ended_at}` : ''}`);
  lines.push(`Charge: ${run.charge.map((c) => `${c.name} ${c.amount} ${c.unit}`).join(', ') || 'not recorded'}`);
  lines.push(`Pressure: ${(report.pressurePa / 1000).toFixed(2)} kPa${run.pressure_pa == null ? ' (assumed)' : ''}`);
  lines.push(`Column: ${run.column ? `${run.column.description}${run.column.theoretical_plates != null ? `, ${run.column.theoretical_plates} plates planned` : ''}` : 'not recorded'}`);
  lines.push(`Source: ${run.source.label}`);
  lines.push(`Heat: ${run.heat_changes.length === 0 ? 'no changes recorded' : run.heat_changes.map((h) => `${clockTime(h.time_s)} ${h.text}`).join('; ')}`);
  lines.push('', 'Timeline:');
  for (const e of runTimeline(run)) lines.push(`  ${clockTime(e.timeS)}  ${e.kind}: ${e.text}${e.headC != null ? ` at ${degrees(e.headC)}` : ''}`);
  lines.push('', 'Fractions:');
  for (const r of report.rows) {
    lines.push(`  Receiver ${r.receiver}: ${degrees(r.minHeadC)} to ${degrees(r.maxHeadC)}, ${clockTime(r.fromS)} to ${clockTime(r.toS)}; ${millilitres(r.volumeM3)}, ${grams(r.massKg)}`);
    if (r.measured) lines.push(`    analysis: ${compositionWords(report.components, r.measured.mass, 'mass')}; ${r.measuredBy}`);
    if (r.estimated) lines.push(`    from head temperature: ${compositionWords(report.components, r.estimated.mass, 'mass')}`);
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
    lines.push(`Plates: ${p.plates.toFixed(1)} theoretical plates (${p.stages.toFixed(1)} stages with the pot), from receiver ${p.receiver}: xD ${p.distillateLight.toFixed(3)}, xW ${p.potLight.toFixed(3)}, α ${p.alpha.toFixed(2)}${p.hetpM !== null ? `; HETP ${(p.hetpM * 100).toFixed(1)} cm` : ''}`);
    lines.push(`  Method: ${plateMethod}`);
  }
  if (report.problems.length > 0) lines.push('', ...report.problems.map((p) => `Note: ${p}`));
  for (const n of run.notes) lines.push(`Note at ${clockTime(n.time_s)}: ${n.text}`);
  return `${lines.join('\n')}\n`;
}
