import { parseArgs, requireOption } from '../args.ts';
import { UsageError, type Command } from '../command.ts';
import { correctLinearisedTypeKC } from '../../sensor/protocols/linearisedTypeK.ts';
import {
  compensatedTemperatureC,
  isThermocoupleType,
  measuredEmfMv,
  thermocoupleTypes,
  type ThermocoupleType,
} from '../../sensor/protocols/thermocouple.ts';
import { parseUnitSuffix, toCelsius } from '../../sensor/protocols/units.ts';

const help = `usage: tc --type K (--mv EMF | --temp T | --linearised T) [--cj T]

Thermocouple conversion with the NIST ITS-90 reference functions (NIST Monograph 175).

  --type K|J|T|E|N   thermocouple type
  --mv 3.217mV       EMF measured between the terminals (mV; the unit may be omitted)
  --temp 100C        hot-junction temperature: prints the EMF (C, F or K; degC if omitted)
  --linearised 197.9C  reading of a type K board that uses one fixed Seebeck coefficient
                     (41.276 uV/degC, MAX31855 style): prints the corrected temperature
  --cj 22C           cold-junction (terminal) temperature, default 0 degC

examples:
  tc --type K --mv 4.096            99.99 degC (the table's 4.096 mV is rounded)
  tc --type K --mv 3.217 --cj 22C   the same junction, terminals at 22 degC
  tc --type K --temp 100            4.0962 mV`;

function number(text: string, name: string): { value: number; suffix: string } {
  const match = /^([+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?)\s*(.*)$/.exec(text.trim());
  if (!match) throw new UsageError(`--${name} must be a number, got "${text}"`);
  return { value: Number(match[1]), suffix: match[2]! };
}

function temperatureOptionC(text: string, name: string): number {
  const { value, suffix } = number(text, name);
  const unit = parseUnitSuffix(suffix);
  if (unit === null || unit === 'mV') throw new UsageError(`--${name} takes a temperature (C, F or K), got "${text}"`);
  return toCelsius(value, unit ?? 'C');
}

function emfOptionMv(text: string): number {
  const { value, suffix } = number(text, 'mv');
  if (suffix === '' || /^mv$/i.test(suffix)) return value;
  if (/^uv$|^µv$/i.test(suffix)) return value / 1000;
  if (/^v$/i.test(suffix)) return value * 1000;
  throw new UsageError(`--mv takes an EMF in mV (or uV, V), got "${text}"`);
}

export const tc: Command = {
  name: 'tc',
  summary: 'thermocouple EMF to temperature and back (NIST ITS-90, types K J T E N)',
  help,
  run(args, io) {
    const parsed = parseArgs(args, { values: ['type', 'mv', 'temp', 'cj', 'linearised'] });
    const typeName = requireOption(parsed, 'type').toUpperCase();
    if (!isThermocoupleType(typeName)) throw new UsageError(`--type must be one of ${thermocoupleTypes.join(', ')}, got "${typeName}"`);
    const type: ThermocoupleType = typeName;
    const given = ['mv', 'temp', 'linearised'].filter((name) => parsed.options.has(name));
    if (given.length !== 1) throw new UsageError('give exactly one of --mv, --temp, --linearised');
    const cjText = parsed.options.get('cj');
    const cjC = cjText === undefined ? 0 : temperatureOptionC(cjText, 'cj');
    const junction = cjText === undefined ? 'reference junction at 0 degC' : `cold junction at ${cjC.toFixed(2)} degC`;

    if (given[0] === 'mv') {
      const tC = compensatedTemperatureC(type, emfOptionMv(parsed.options.get('mv')!), cjC);
      io.out(`${tC.toFixed(2)} degC  (type ${type}, ${junction})`);
    } else if (given[0] === 'temp') {
      const emf = measuredEmfMv(type, temperatureOptionC(parsed.options.get('temp')!, 'temp'), cjC);
      io.out(`${emf.toFixed(4)} mV  (type ${type}, ${junction})`);
    } else {
      if (type !== 'K') throw new UsageError('--linearised applies to type K boards only');
      if (cjText === undefined) throw new UsageError('--linearised needs --cj, the board\'s cold-junction reading');
      const tC = correctLinearisedTypeKC(temperatureOptionC(parsed.options.get('linearised')!, 'linearised'), cjC);
      io.out(`${tC.toFixed(2)} degC  (type K, corrected from a 41.276 uV/degC board, ${junction})`);
    }
    return 0;
  },
};
