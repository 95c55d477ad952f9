import {
  thermocoupleCoefficients,
  type ForwardRange,
  type ThermocoupleType,
} from './thermocoupleCoefficients.ts';

export type { ThermocoupleType } from './thermocoupleCoefficients.ts';

export const thermocoupleTypes: readonly ThermocoupleType[] = ['E', 'J', 'K', 'N', 'T'];

export function isThermocoupleType(name: string): name is ThermocoupleType {
  return (thermocoupleTypes as readonly string[]).includes(name);
}

function forwardRange(type: ThermocoupleType, tC: number): ForwardRange {
  const ranges = thermocoupleCoefficients[type].forward;
  const first = ranges[0]!;
  const last = ranges[ranges.length - 1]!;
  if (!(tC >= first.fromC && tC <= last.toC)) {
    throw new RangeError(`type ${type} reference function covers ${first.fromC} to ${last.toC} degC, not ${tC}`);
  }
  return ranges.find((r) => tC <= r.toC)!;
}

function polynomial(c: readonly number[], x: number): number {
  let sum = 0;
  for (let i = c.length - 1; i >= 0; i--) sum = sum * x + c[i]!;
  return sum;
}

function polynomialSlope(c: readonly number[], x: number): number {
  let sum = 0;
  for (let i = c.length - 1; i >= 1; i--) sum = sum * x + i * c[i]!;
  return sum;
}

/**
 * Thermocouple EMF with the reference junction at 0 degC: the NIST ITS-90 reference function.
 * Units: tC in degC, result in mV.
 */
export function emfMv(type: ThermocoupleType, tC: number): number {
  const range = forwardRange(type, tC);
  let e = polynomial(range.c, tC);
  if (range.exponential) {
    const [a0, a1, a2] = range.exponential;
    e += a0 * Math.exp(a1 * (tC - a2) ** 2);
  }
  return e;
}

/** Seebeck coefficient dE/dt of the reference function. Units: mV/degC. */
export function seebeckMvPerC(type: ThermocoupleType, tC: number): number {
  const range = forwardRange(type, tC);
  let s = polynomialSlope(range.c, tC);
  if (range.exponential) {
    const [a0, a1, a2] = range.exponential;
    s += a0 * Math.exp(a1 * (tC - a2) ** 2) * 2 * a1 * (tC - a2);
  }
  return s;
}

/**
 * The NIST approximate inverse polynomial alone. Its stated error is a few hundredths of a
 * degree (up to 0.05 degC for type K, 0 to 500 degC), so `temperatureC` refines it.
 * Units: emf in mV, result in degC.
 */
export function inversePolynomialC(type: ThermocoupleType, emf: number): number {
  const ranges = thermocoupleCoefficients[type].inverse;
  const first = ranges[0]!;
  const last = ranges[ranges.length - 1]!;
  if (!(emf >= first.fromMv && emf <= last.toMv)) {
    throw new RangeError(`type ${type} inverse covers ${first.fromMv} to ${last.toMv} mV, not ${emf}`);
  }
  return polynomial(ranges.find((r) => emf <= r.toMv)!.d, emf);
}

/**
 * Temperature of the measuring junction from the EMF with the reference junction at 0 degC.
 * Starts from the NIST inverse polynomial and takes Newton steps on the reference function, so
 * the result inverts `emfMv` to far better than the polynomial's own hundredths of a degree.
 * Units: emf in mV, result in degC.
 */
export function temperatureC(type: ThermocoupleType, emf: number): number {
  let t = inversePolynomialC(type, emf);
  for (let i = 0; i < 8; i++) {
    const step = (emfMv(type, t) - emf) / seebeckMvPerC(type, t);
    t -= step;
    if (Math.abs(step) < 1e-9) break;
  }
  return t;
}

/**
 * Cold-junction compensation: the hot-junction temperature from the EMF measured between the
 * thermocouple's terminals and the temperature of those terminals (the cold junction).
 * Units: measured in mV, coldJunctionC and result in degC.
 */
export function compensatedTemperatureC(type: ThermocoupleType, measuredMv: number, coldJunctionC: number): number {
  if (!Number.isFinite(measuredMv)) throw new RangeError('thermocouple EMF must be a finite number of mV');
  return temperatureC(type, measuredMv + emfMv(type, coldJunctionC));
}

/**
 * The EMF a thermocouple gives between its terminals with the hot junction at hotC and the
 * terminals at coldJunctionC. Units: degC in, mV out.
 */
export function measuredEmfMv(type: ThermocoupleType, hotC: number, coldJunctionC: number): number {
  return emfMv(type, hotC) - emfMv(type, coldJunctionC);
}
