import type { Command } from '../command.ts';
import { parseArgs, requireOption } from '../args.ts';
import { UsageError } from '../command.ts';
import { estimatePlates, molesFromAmounts, moleFractions, parseLengthM, parseVolumeM3, planCuts, type Packing } from '../../science/index.ts';
import { labPressure, parseBasis, parseMix, parseModel, round } from './scienceOptions.ts';

export const plan: Command = {
  name: 'plan',
  summary: 'cut plan for a charge: receivers, head-temperature windows, advice',
  help: [
    'usage: cutbell plan --mix "a:0.4,b:0.6" --charge 60mL (--pressure P | --altitude H)',
    '                    (--plates N | --packing KIND --height L) [--model ideal|unifac] [--basis mole|mass|volume] [--json]',
    '',
    '  --mix       the charge: compound:amount pairs on --basis (fractions, or mL/g/mol)',
    '  --charge    the charge\'s liquid volume (60mL)',
    '  --plates    theoretical plates of the column (0 for a still head alone)',
    '  --packing   vigreux, glass-beads, raschig-rings, metal-sponge, helices, structured-mesh, spinning-band, none',
    '  --height    packed height (30cm), with --packing',
    '  --model     ideal (default) or unifac',
    '',
    'example: cutbell plan --mix "hexane:0.4,toluene:0.6" --charge 60mL --pressure 745mmHg --plates 5 --json',
    'The plan is an estimate; the lab\'s procedures and local rules come first.',
  ].join('\n'),
  run(args, io) {
    const parsed = parseArgs(args, { values: ['mix', 'charge', 'pressure', 'altitude', 'sea-level', 'plates', 'packing', 'height', 'model', 'basis'], flags: ['json'] });
    const { compounds, amounts } = parseMix(requireOption(parsed, 'mix'));
    const basis = parseBasis(parsed);
    const model = parseModel(parsed);
    const x = moleFractions(compounds, amounts, basis);
    const chargeM3 = parseVolumeM3(requireOption(parsed, 'charge'));
    // Moles in the charge: the mole fractions' mixture volume per mole (ideal mixing) scaled.
    const molarVolume = molesFromAmounts(compounds, x, 'mole').reduce((s, n, i) => s + (n * compounds[i]!.molarMassKgPerMol!) / compounds[i]!.liquidDensityKgPerM3!, 0);
    if (!(molarVolume > 0)) throw new UsageError('a compound in the charge has no density or molar mass; give --mix by mole with a known charge');
    let plates: number;
    const platesText = parsed.options.get('plates');
    if (platesText !== undefined) {
      plates = Number(platesText);
      if (!(plates >= 0)) throw new UsageError(`--plates must be a number >= 0 (got ${platesText})`);
    } else if (parsed.options.has('packing')) {
      plates = estimatePlates(parsed.options.get('packing') as Packing, parsed.options.get('packing') === 'none' ? 1 : parseLengthM(requireOption(parsed, 'height')));
    } else {
      throw new UsageError('give --plates N, or --packing and --height');
    }
    const { pPa, warning } = labPressure(parsed);
    const result = planCuts({ compounds, x, chargeMol: chargeM3 / molarVolume, pPa, plates, model });
    if (parsed.options.has('json')) {
      io.out(JSON.stringify({
        p_pa: round(pPa, 1), plates: round(plates, 2), model,
        fractions: result.fractions.map((f) => ({ receiver: f.receiver, compound: f.compound, from_c: round(f.fromTK - 273.15, 1), to_c: round(f.toTK - 273.15, 1), volume_ml: round(f.volumeM3 * 1e6, 1) })),
        boiling_points: result.boilingPoints.map((b) => ({ compound: b.compound, t_c: round(b.tK - 273.15, 2), is_extrapolated: b.isExtrapolated })),
        relative_volatility: result.relativeVolatilities.map((r) => ({ pair: r.pair, at_start: round(r.atStart, 3), at_end: round(r.atEnd, 3) })),
        minimum_stages: result.minimumStages.map((n) => (Number.isFinite(n) ? round(n, 2) : null)),
        expected_plateaus: result.expectedPlateaus.map((p) => ({ label: p.label, from_c: round(p.fromTK - 273.15, 1), to_c: round(p.toTK - 273.15, 1), reaches_purity: p.reachesPurity })),
        azeotropes: result.azeotropes.map((a) => ({ pair: a.pair, status: a.status, azeotropes: a.azeotropes.map((z) => ({ kind: z.kind, t_c: round(z.tK - 273.15, 2), x1: round(z.x1, 3) })) })),
        advice: result.advice.map((a) => ({ kind: a.kind, text: a.text })),
        is_estimated: result.isEstimated, warning,
      }));
    } else {
      io.out(`cut plan at ${(pPa / 1000).toFixed(2)} kPa, ${plates.toFixed(1)} plates, ${model} model`);
      for (const f of result.fractions) {
        io.out(`  receiver ${f.receiver}: ${(f.compound ?? 'intermediate').padEnd(24)} ${(f.fromTK - 273.15).toFixed(1)}-${(f.toTK - 273.15).toFixed(1)} degC  about ${(f.volumeM3 * 1e6).toFixed(1)} mL`);
      }
      io.out(`  plateaus expected: ${result.expectedPlateaus.map((p) => `${p.label} ${(p.fromTK - 273.15).toFixed(1)}-${(p.toTK - 273.15).toFixed(1)} degC${p.reachesPurity ? '' : ' (never 90 % pure with this column: the head passes through)'}`).join('; ')}`);
      for (const a of result.advice) io.out(`${a.kind === 'caution' ? 'caution' : 'advice'}: ${a.text}`);
      if (warning) io.err(`warning: ${warning}`);
    }
    return 0;
  },
};
