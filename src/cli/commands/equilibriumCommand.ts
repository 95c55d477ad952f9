import type { Command } from '../command.ts';
import { parseArgs, requireOption } from '../args.ts';
import { bubbleT, dewT, moleFractions } from '../../science/index.ts';
import { labPressure, parseBasis, parseMix, parseModel, round } from './scienceOptions.ts';

/** bubble and dew share their options; only the solve differs. */
export function equilibriumCommand(kind: 'bubble' | 'dew'): Command {
  const phase = kind === 'bubble' ? 'liquid' : 'vapour';
  return {
    name: kind,
    summary: `${kind} temperature of a ${phase} mixture at a pressure`,
    help: [
      `usage: cutbell ${kind} --mix "a:0.4,b:0.6" (--pressure P | --altitude H) [--model ideal|unifac] [--basis mole|mass|volume] [--json]`,
      '',
      `  --mix      the ${phase}: compound:amount pairs; amounts are fractions or mL/g/mol on --basis`,
      '  --pressure the lab pressure with its unit (745mmHg, 101.3kPa)',
      '  --model    ideal (Raoult, default) or unifac (original UNIFAC activity coefficients)',
      '  --basis    mole (default), mass or volume',
      '',
      `example: cutbell ${kind} --mix "hexane:0.4,toluene:0.6" --pressure 745mmHg --model unifac --json`,
    ].join('\n'),
    run(args, io) {
      const parsed = parseArgs(args, { values: ['mix', 'pressure', 'altitude', 'sea-level', 'model', 'basis'], flags: ['json'] });
      const { compounds, amounts } = parseMix(requireOption(parsed, 'mix'));
      const model = parseModel(parsed);
      const fractions = moleFractions(compounds, amounts, parseBasis(parsed));
      const { pPa, warning } = labPressure(parsed);
      const result = kind === 'bubble' ? bubbleT(compounds, fractions, pPa, model) : dewT(compounds, fractions, pPa, model);
      const other = kind === 'bubble' ? result.y : result.x;
      const byName = (v: number[]) => Object.fromEntries(compounds.map((c, i) => [c.name, round(v[i]!, 4)]));
      if (parsed.options.has('json')) {
        io.out(JSON.stringify({ t_c: round(result.tK - 273.15, 2), p_pa: round(pPa, 1), x: byName(result.x), y: byName(result.y), model, is_estimated: result.isEstimated, is_extrapolated: result.isExtrapolated, warning }));
      } else {
        io.out(`${kind} point ${(result.tK - 273.15).toFixed(1)} degC at ${(pPa / 1000).toFixed(2)} kPa (${model})`);
        io.out(`  ${kind === 'bubble' ? 'vapour' : 'liquid'}: ${compounds.map((c, i) => `${c.name} ${(other[i]! * 100).toFixed(1)} mol %`).join(', ')}`);
        if (result.isExtrapolated) io.out('  note: a vapour pressure is used outside its correlation\'s range (Clausius-Clapeyron extrapolation)');
        if (result.isEstimated) io.out('  note: built on an estimated vapour pressure');
        if (warning) io.err(`warning: ${warning}`);
      }
      return 0;
    },
  };
}

export const bubble = equilibriumCommand('bubble');
export const dew = equilibriumCommand('dew');
