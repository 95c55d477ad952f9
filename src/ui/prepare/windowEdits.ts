import type { RunWindow } from '../../run/index.ts';
import { normaliseCutPlan } from '../../signal/index.ts';
import type { TemperatureUnitSetting } from '../../store/index.ts';
import { formatDecimal, fromDisplayTemperature, parseDecimal, toDisplayTemperature, type DecimalSeparator } from '../units/index.ts';

/** A window's bounds as typed, on the chemist's scale. */
export interface WindowTexts {
  fromText: string;
  toText: string;
}

export function windowTexts(windows: readonly RunWindow[], unit: TemperatureUnitSetting, separator: DecimalSeparator): WindowTexts[] {
  return windows.map((w) => ({ fromText: formatDecimal(toDisplayTemperature(w.fromC, unit), separator, 1), toText: formatDecimal(toDisplayTemperature(w.toC, unit), separator, 1) }));
}

/**
 * The windows as edited: each bound parsed in the chemist's unit and checked as the run's
 * detector will check them (increasing, not overlapping). Problems by `${index}-from|to`, or
 * `all` for the set.
 */
export function readWindowTexts(base: readonly RunWindow[], texts: readonly WindowTexts[], unit: TemperatureUnitSetting, separator: DecimalSeparator): { windows: RunWindow[] | null; problems: Record<string, string> } {
  const problems: Record<string, string> = {};
  const windows = base.map((w, i) => {
    const read = (text: string, side: 'from' | 'to'): number => {
      try {
        return fromDisplayTemperature(parseDecimal(text, separator), unit);
      } catch (error) {
        problems[`${i}-${side}`] = (error as Error).message;
        return Number.NaN;
      }
    };
    return { ...w, fromC: read(texts[i]?.fromText ?? '', 'from'), toC: read(texts[i]?.toText ?? '', 'to') };
  });
  if (Object.keys(problems).length > 0) return { windows: null, problems };
  try {
    normaliseCutPlan(windows);
  } catch (error) {
    problems['all'] = (error as Error).message.replace(/(-?\d+(?:\.\d+)?) degC/g, (_, v: string) => `${formatDecimal(toDisplayTemperature(Number(v), unit), separator, 1)} ${unit === 'degF' ? '°F' : '°C'}`);
    return { windows: null, problems };
  }
  for (let i = 1; i < windows.length; i++) {
    if (windows[i]!.fromC < windows[i - 1]!.fromC) {
      problems['all'] = `receiver ${windows[i]!.receiver} starts below receiver ${windows[i - 1]!.receiver}: keep receivers in order of temperature`;
      return { windows: null, problems };
    }
  }
  return { windows, problems };
}

/** Receivers `index` and `index + 1` collected in one: the lower's start, the upper's end, numbers closed up. */
export function joinWithNext(windows: readonly RunWindow[], index: number): RunWindow[] {
  const lower = windows[index];
  const upper = windows[index + 1];
  if (!lower || !upper) return windows.map((w) => ({ ...w }));
  const joined: RunWindow = {
    receiver: lower.receiver,
    fromC: lower.fromC,
    toC: upper.toC,
    compound: lower.compound === upper.compound ? lower.compound : null,
    volumeMl: lower.volumeMl !== null && upper.volumeMl !== null ? lower.volumeMl + upper.volumeMl : null,
  };
  return [...windows.slice(0, index), joined, ...windows.slice(index + 2)].map((w, i) => ({ ...w, receiver: i + 1 }));
}
