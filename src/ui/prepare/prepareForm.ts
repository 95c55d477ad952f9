import type { Packing } from '../../science/index.ts';
import type { PressureUnitSetting, TemperatureUnitSetting } from '../../store/index.ts';

/** How a charge row's amount is given; '%' rows share one basis and a total volume. */
export type AmountUnit = 'mL' | 'g' | 'mol' | '%';
export type PercentBasis = 'volume' | 'mass' | 'mole';

/** One compound of the charge as typed: any name, synonym or CAS number, and an amount. */
export interface ChargeRow {
  query: string;
  amountText: string;
  unit: AmountUnit;
}

/** A compound of the chemist's own, as typed (numbers as text, so nothing typed is lost). */
export interface UserCompoundForm {
  name: string;
  boilingPointText: string;
  boilingPointUnit: TemperatureUnitSetting;
  /** Units: g/mol */
  molarMassText: string;
  /** Units: g/mL near 20 degC */
  densityText: string;
  antoineAText: string;
  antoineBText: string;
  antoineCText: string;
  antoinePressureUnit: 'mmHg' | 'kPa' | 'bar' | 'Pa';
  antoineTemperatureUnit: 'C' | 'K';
  isHydrogenBonded: boolean;
}

export type PressureMethod = 'barometer' | 'altitude' | 'sea-level';

export interface PressureForm {
  method: PressureMethod;
  /** The barometer reading, or the weather report's sea-level value. */
  valueText: string;
  unit: PressureUnitSetting;
  /** Optional with a barometer reading (it lets the app check the value). */
  altitudeText: string;
  altitudeUnit: 'm' | 'ft';
}

export type ColumnKind = 'none' | 'indented' | 'packed' | 'learned';

export interface ColumnForm {
  kind: ColumnKind;
  packing: Exclude<Packing, 'none' | 'vigreux'>;
  /** Units: cm */
  heightText: string;
  learnedId: string;
}

export const heatSources = {
  'mantle': 'Heating mantle',
  'oil-bath': 'Oil bath',
  'water-bath': 'Water bath',
  'sand-bath': 'Sand bath',
  'hot-plate': 'Hot plate with a bath',
} as const;
export type HeatSource = keyof typeof heatSources;

export interface HeatForm {
  source: HeatSource;
  /** Highest temperature the heat source reaches (its setting or its surface). */
  maxText: string;
  maxUnit: TemperatureUnitSetting;
}

/** Everything on the Prepare screen, as typed. */
export interface PrepareForm {
  title: string;
  rows: ChargeRow[];
  percentBasis: PercentBasis;
  /** Total charge volume when amounts are percentages. Units: mL */
  totalText: string;
  userCompounds: UserCompoundForm[];
  pressure: PressureForm;
  column: ColumnForm;
  heat: HeatForm;
}

export function emptyUserCompound(unit: TemperatureUnitSetting): UserCompoundForm {
  return {
    name: '', boilingPointText: '', boilingPointUnit: unit, molarMassText: '', densityText: '',
    antoineAText: '', antoineBText: '', antoineCText: '', antoinePressureUnit: 'mmHg', antoineTemperatureUnit: 'C', isHydrogenBonded: false,
  };
}

/** A new, empty form in the chemist's units. */
export function emptyPrepareForm(temperatureUnit: TemperatureUnitSetting, pressureUnit: PressureUnitSetting): PrepareForm {
  return {
    title: '',
    rows: [{ query: '', amountText: '', unit: 'mL' }, { query: '', amountText: '', unit: 'mL' }],
    percentBasis: 'volume',
    totalText: '',
    userCompounds: [],
    pressure: { method: 'barometer', valueText: '', unit: pressureUnit, altitudeText: '', altitudeUnit: 'm' },
    column: { kind: 'none', packing: 'raschig-rings', heightText: '', learnedId: '' },
    heat: { source: 'mantle', maxText: '', maxUnit: temperatureUnit },
  };
}
