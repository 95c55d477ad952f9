import { formatWithMark } from '../../science/units/index.ts';
import type { DecimalSeparatorSetting } from '../../store/index.ts';

/** The mark between the whole and the fractional part of a typed number. */
export type DecimalSeparator = '.' | ',';

/** The decimal mark of a locale (the phone's when none is given), from Intl. */
export function localeDecimalSeparator(locale?: string): DecimalSeparator {
  const part = new Intl.NumberFormat(locale).formatToParts(1.5).find((p) => p.type === 'decimal');
  return part?.value === ',' ? ',' : '.';
}

/** The separator in force: the setting, or the locale's when the setting is 'auto'. */
export function resolveDecimalSeparator(setting: DecimalSeparatorSetting, locale?: string): DecimalSeparator {
  return setting === 'auto' ? localeDecimalSeparator(locale) : setting;
}

const withPoint = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)$/;
const withComma = /^[+-]?(?:\d+(?:,\d*)?|,\d+)$/;

/**
 * A typed number with the given decimal mark: "1,5" is 1.5 with ','. The other mark is refused,
 * never guessed: in a comma locale "1.000" means a thousand, and a wrong guess moves a charge
 * a thousandfold. Throws RangeError with a message for the chemist.
 */
export function parseDecimal(text: string, separator: DecimalSeparator): number {
  const trimmed = text.trim().replace(/^\u2212/, '-');
  if (trimmed === '') throw new RangeError('enter a number');
  const other = separator === ',' ? '.' : ',';
  if (trimmed.includes(other)) {
    const example = separator === ',' ? '1,5' : '1.5';
    throw new RangeError(`write decimals with "${separator}" (e.g. ${example}), as set in Settings; no thousands marks`);
  }
  if (!(separator === ',' ? withComma : withPoint).test(trimmed)) throw new RangeError(`"${text.trim()}" is not a number`);
  return Number(trimmed.replace(',', '.'));
}

/** A number written with the given decimal mark and a fixed number of decimals ('–' when not finite). */
export const formatDecimal: (value: number, separator: DecimalSeparator, decimals: number) => string = formatWithMark;

/** Rewrites a number typed with one mark for the other (templates keep '.' inside). */
export function switchDecimalMark(text: string, from: DecimalSeparator, to: DecimalSeparator): string {
  return from === to ? text : text.replaceAll(from, to);
}
