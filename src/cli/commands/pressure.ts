import type { Command } from '../command.ts';
import { parseArgs } from '../args.ts';
import { UsageError } from '../command.ts';
import { checkStationPressure, parseLengthM, parsePressurePa, seaLevelFromStationPa, standardPressurePa, stationFromSeaLevelPa } from '../../science/index.ts';
import { round } from './scienceOptions.ts';

export const pressure: Command = {
  name: 'pressure',
  summary: 'the lab\'s station pressure from altitude, a weather report, or a check of a reading',
  help: [
    'usage: cutbell pressure --altitude H [--sea-level P | --station P] [--json]',
    '',
    '  --altitude H    lab altitude above sea level (1500m, 4900ft)',
    '  --sea-level P   a weather report\'s (sea-level) pressure: prints the station pressure',
    '  --station P     a barometer reading in the lab: prints its sea-level value and checks it',
    '  alone, --altitude gives the US Standard Atmosphere 1976 pressure',
    '',
    'example: cutbell pressure --altitude 1500m --sea-level 1013hPa',
  ].join('\n'),
  run(args, io) {
    const parsed = parseArgs(args, { values: ['altitude', 'sea-level', 'station'], flags: ['json'] });
    const altitude = parsed.options.get('altitude');
    if (altitude === undefined) throw new UsageError('--altitude is required (e.g. --altitude 1500m)');
    const altitudeM = parseLengthM(altitude);
    const seaLevel = parsed.options.get('sea-level');
    const station = parsed.options.get('station');
    if (seaLevel !== undefined && station !== undefined) throw new UsageError('give --sea-level or --station, not both');
    let stationPa: number;
    let seaLevelPa: number;
    let warning: string | null = null;
    if (station !== undefined) {
      stationPa = parsePressurePa(station);
      seaLevelPa = seaLevelFromStationPa(stationPa, altitudeM);
      warning = checkStationPressure(stationPa, altitudeM)?.message ?? null;
    } else if (seaLevel !== undefined) {
      seaLevelPa = parsePressurePa(seaLevel);
      stationPa = stationFromSeaLevelPa(seaLevelPa, altitudeM);
    } else {
      stationPa = standardPressurePa(altitudeM);
      seaLevelPa = 101325;
    }
    if (parsed.options.has('json')) {
      io.out(JSON.stringify({ altitude_m: altitudeM, station_pa: round(stationPa, 1), sea_level_pa: round(seaLevelPa, 1), warning }));
    } else {
      io.out(`station pressure at ${altitudeM.toFixed(0)} m: ${(stationPa / 1000).toFixed(2)} kPa (${(stationPa / 133.322387415).toFixed(1)} mmHg); sea-level equivalent ${(seaLevelPa / 100).toFixed(1)} hPa`);
      if (warning) io.err(`warning: ${warning}`);
    }
    return 0;
  },
};
