import { formatPressure } from './formatQuantity.ts';

/** The temperature scale figures are shown on (inside, everything is K or degC). */
export type TemperatureScale = 'degC' | 'degF';
/** The mark between the whole and the fractional part of a number. */
export type DecimalMark = '.' | ',';

/** How a reader wants figures written: their temperature scale, pressure unit and decimal mark. */
export interface FigureStyle {
  temperature: TemperatureScale;
  /** Any unit formatPressure knows: kPa, hPa, mbar, mmHg, Torr, inHg, atm, psi. */
  pressure: string;
  decimalMark: DecimalMark;
}

/** The laboratory's usual style: degC, kPa and a decimal point. */
export const laboratoryFigureStyle: Readonly<FigureStyle> = Object.freeze({ temperature: 'degC', pressure: 'kPa', decimalMark: '.' });

export const temperatureScaleLabel: Readonly<Record<TemperatureScale, string>> = { degC: '°C', degF: '°F' };

// degF = degC x 9/5 + 32 (exact, by the definition of the Fahrenheit scale; NIST SP 811 B.8).
/** A degC value on the reader's scale. */
export function toTemperatureScale(tC: number, scale: TemperatureScale): number {
  return scale === 'degF' ? tC * 1.8 + 32 : tC;
}

/** A value on the reader's scale back to degC. */
export function fromTemperatureScale(value: number, scale: TemperatureScale): number {
  return scale === 'degF' ? (value - 32) / 1.8 : value;
}

/** A temperature difference (a window's width, a rate) on the reader's scale. */
export function toTemperatureScaleDifference(dC: number, scale: TemperatureScale): number {
  return scale === 'degF' ? dC * 1.8 : dC;
}

/** A number with a fixed number of decimals and the given mark; a dash when not finite. */
export function formatWithMark(value: number, mark: DecimalMark, decimals: number): string {
  if (!Number.isFinite(value)) return '–';
  const text = (Math.abs(value) < 0.5 * 10 ** -decimals ? 0 : value).toFixed(decimals);
  return mark === ',' ? text.replace('.', ',') : text;
}

const dash = '—';
const known = (v: number | null | undefined): v is number => v != null && Number.isFinite(v);

/** Figures written in one style; every function gives a dash for a missing or non-finite value. */
export interface Figures {
  readonly style: FigureStyle;
  /** "°C" or "°F". */
  readonly temperatureLabel: string;
  /** "78.4 °C" (degC in). */
  temperature(tC: number | null | undefined, decimals?: number): string;
  /** "78.4" (degC in), no unit. */
  temperatureNumber(tC: number | null | undefined, decimals?: number): string;
  /** "1.8 °F" for a 1 degC difference. */
  temperatureDifference(dC: number | null | undefined, decimals?: number): string;
  /** "101.3 kPa" (Pa in), four significant digits. */
  pressure(pPa: number | null | undefined): string;
  number(value: number | null | undefined, decimals: number): string;
  /** "97.0 %" (a fraction in). */
  percent(fraction: number | null | undefined): string;
  /** "12.30 g" (kg in). */
  grams(kg: number | null | undefined): string;
  /** "15.0 mL" (m^3 in). */
  millilitres(m3: number | null | undefined): string;
}

/** The figure writer for a style. */
export function figuresFor(style: FigureStyle = laboratoryFigureStyle): Figures {
  const { temperature: scale, decimalMark: mark } = style;
  const label = temperatureScaleLabel[scale];
  const number = (value: number | null | undefined, decimals: number) => (known(value) ? formatWithMark(value, mark, decimals) : dash);
  return {
    style,
    temperatureLabel: label,
    temperature: (tC, decimals = 1) => (known(tC) ? `${formatWithMark(toTemperatureScale(tC, scale), mark, decimals)} ${label}` : dash),
    temperatureNumber: (tC, decimals = 1) => (known(tC) ? formatWithMark(toTemperatureScale(tC, scale), mark, decimals) : dash),
    temperatureDifference: (dC, decimals = 1) => (known(dC) ? `${formatWithMark(toTemperatureScaleDifference(dC, scale), mark, decimals)} ${label}` : dash),
    pressure: (pPa) => {
      if (!known(pPa)) return dash;
      const text = formatPressure(pPa, style.pressure);
      return mark === ',' ? text.replace('.', ',') : text;
    },
    number,
    percent: (f) => (known(f) ? `${formatWithMark(100 * f, mark, 1)} %` : dash),
    grams: (kg) => (known(kg) ? `${formatWithMark(kg * 1000, mark, 2)} g` : dash),
    millilitres: (m3) => (known(m3) ? `${formatWithMark(m3 * 1e6, mark, 1)} mL` : dash),
  };
}
