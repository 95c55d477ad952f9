import type { Compound } from './compound.ts';
import { handbookProperties } from './handbookProperties.ts';
import { liquidHeatCapacitiesJPerMolK } from './liquidHeatCapacities.ts';
import { molarMassFromFormula } from './molarMassFromFormula.ts';
import { normaliseName } from './normaliseName.ts';
import { referenceRecords } from './referenceData.generated.ts';
import { clausiusClapeyronEnthalpyJPerMol } from './vapourPressure.ts';

const fromMemory = '(from memory) handbook/SDS value of the usual kind; check the supplier SDS';
// GHS flammable liquids category 1-2: flash point below 23 degC (from memory).
const veryFlammableBelowC = 23;

// Acetic acid vapour is largely dimerised, so the Clausius-Clapeyron slope (38.8 kJ/mol) is
// not the heat actually taken up per mole boiled; the calorimetric value near Tb is about
// 23.7 kJ/mol (CRC Handbook, from memory).
const calorimetricEnthalpyJPerMol: Readonly<Record<string, number>> = { '64-19-7': 23700 };

function buildCompound(record: (typeof referenceRecords)[number]): Compound {
  const entry = handbookProperties[record.cas];
  if (!entry) throw new Error(`handbookProperties has no entry for CAS ${record.cas}`);
  const groups = record.groups.map(([id, count]) => [id!, count!] as const);
  return {
    id: normaliseName(entry.name),
    name: entry.name,
    synonyms: entry.synonyms,
    cas: record.cas,
    formula: entry.formula,
    molarMassKgPerMol: molarMassFromFormula(entry.formula),
    liquidDensityKgPerM3: entry.densityGPerMl * 1000,
    normalBoilingPointK: record.tbCrcK,
    vapourPressure: record.correlation,
    enthalpyOfVaporisationJPerMol: calorimetricEnthalpyJPerMol[record.cas] ?? clausiusClapeyronEnthalpyJPerMol({ vapourPressure: record.correlation }, record.tbCrcK),
    liquidHeatCapacityJPerMolK: liquidHeatCapacitiesJPerMolK[record.cas] ?? null,
    refractiveIndexD20: entry.refractiveIndexD20,
    flashPointK: entry.flashPointC === null ? null : entry.flashPointC + 273.15,
    autoignitionK: entry.autoignitionC === null ? null : entry.autoignitionC + 273.15,
    hazards: {
      isPeroxideFormer: entry.peroxideFormer ?? false,
      isToxic: entry.toxic ?? false,
      carcinogen: entry.carcinogen ?? null,
      isVeryFlammable: entry.flashPointC !== null && entry.flashPointC < veryFlammableBelowC,
      notes: entry.notes ?? [],
    },
    unifacGroups: groups.length > 0 ? groups : null,
    sources: {
      normalBoilingPointK: 'CRC Handbook of Chemistry and Physics, 95th ed. (2014)',
      vapourPressure: record.correlation.source,
      enthalpyOfVaporisationJPerMol: record.cas in calorimetricEnthalpyJPerMol ? '(from memory) calorimetric value, CRC Handbook; the vapour dimerises' : 'Clausius-Clapeyron slope of the vapour-pressure correlation at the CRC boiling point (ideal vapour; runs a few % above calorimetric values)',
      molarMassKgPerMol: 'computed from the formula with IUPAC conventional atomic weights',
      unifacGroups: record.groupsSource,
      formula: fromMemory,
      synonyms: fromMemory,
      liquidDensityKgPerM3: fromMemory,
      liquidHeatCapacityJPerMolK: '(from memory) NIST WebBook / CRC Handbook value near 25 degC, see liquidHeatCapacities.ts',
      refractiveIndexD20: fromMemory,
      flashPointK: fromMemory,
      autoignitionK: fromMemory,
      hazards: fromMemory,
    },
    isEstimated: false,
    estimateNotes: [],
  };
}

/** The built-in compound library: 46 lab solvents and water, in the reference table's order. */
export const compoundLibrary: readonly Compound[] = referenceRecords.map(buildCompound);
