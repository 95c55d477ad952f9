import type { Command } from '../command.ts';
import { parseArgs } from '../args.ts';
import { UsageError } from '../command.ts';
import { findCompound, tSatK } from '../../science/index.ts';
import { labPressure, round } from './scienceOptions.ts';

export const bp: Command = {
  name: 'bp',
  summary: 'boiling point of a compound at a pressure',
  help: [
    'usage: cutbell bp <compound> (--pressure P | --altitude H [--sea-level P]) [--json]',
    '',
    '  <compound>      a name, synonym or CAS number (ethanol, EtOH, 64-17-5)',
    '  --pressure P    the lab pressure with its unit: 101.3kPa, 745mmHg, 1013hPa, 29.9inHg, 0.98atm',
    '  --altitude H    the lab altitude (1500m); alone it uses the US Standard Atmosphere 1976',
    '  --sea-level P   a weather report\'s sea-level pressure, reduced to the altitude',
    '  --json          one JSON object',
    '',
    'example: cutbell bp toluene --pressure 20kPa',
  ].join('\n'),
  run(args, io) {
    const parsed = parseArgs(args, { values: ['pressure', 'altitude', 'sea-level'], flags: ['json'] });
    const name = parsed.positional.join(' ');
    if (name === '') throw new UsageError('name a compound (e.g. cutbell bp ethanol --pressure 745mmHg)');
    const compound = findCompound(name);
    const { pPa, warning } = labPressure(parsed);
    const result = tSatK(compound, pPa);
    if (parsed.options.has('json')) {
      io.out(JSON.stringify({ compound: compound.name, p_pa: round(pPa, 1), t_c: round(result.tK - 273.15, 2), t_k: round(result.tK, 2), is_extrapolated: result.isExtrapolated, is_estimated: result.isEstimated, source: compound.vapourPressure.source, warning }));
    } else {
      io.out(`${compound.name} boils at ${(result.tK - 273.15).toFixed(1)} degC at ${(pPa / 1000).toFixed(2)} kPa${result.isExtrapolated ? ' (outside the correlation\'s range: Clausius-Clapeyron extrapolation)' : ''}${result.isEstimated ? ' (estimate)' : ''}`);
      io.out(`  vapour pressure: ${compound.vapourPressure.source}`);
      if (warning) io.err(`warning: ${warning}`);
    }
    return 0;
  },
};
