import type { Settings } from '../../store/index.ts';
import { Choice, TextField } from './Field.tsx';
import type { FormReading } from './readPrepareForm.ts';
import { emptyUserCompound, type AmountUnit, type ChargeRow, type PrepareForm, type UserCompoundForm } from './prepareForm.ts';
import { temperatureUnitLabel } from '../units/index.ts';

interface ChargeSectionProps {
  form: PrepareForm;
  reading: FormReading;
  settings: Settings;
  onChange(form: PrepareForm): void;
}

const amountUnits: ReadonlyArray<readonly [AmountUnit, string]> = [['mL', 'mL'], ['g', 'g'], ['mol', 'mol'], ['%', '%']];

/** The charge: compounds by any name or CAS number, amounts, and the chemist's own compounds. */
export function ChargeSection({ form, reading, settings, onChange }: ChargeSectionProps) {
  const setRow = (i: number, change: Partial<ChargeRow>) => onChange({ ...form, rows: form.rows.map((r, k) => (k === i ? { ...r, ...change } : r)) });
  const setUser = (i: number, change: Partial<UserCompoundForm>) => onChange({ ...form, userCompounds: form.userCompounds.map((u, k) => (k === i ? { ...u, ...change } : u)) });
  const isPercent = form.rows.some((r) => r.unit === '%');
  const p = reading.problems;

  return (
    <section class="prepare-section" aria-labelledby="charge-title">
      <h2 id="charge-title">Charge</h2>
      {form.rows.map((row, i) => {
        const found = reading.resolved[i];
        return (
          <div class="charge-row" key={i} data-testid={`charge-row-${i}`}>
            <TextField
              label={`Compound ${i + 1}`}
              inputMode="text"
              value={row.query}
              placeholder="name or CAS number"
              problem={p[`row-${i}-name`]}
              hint={found ? `${found.name}${found.cas ? ` (CAS ${found.cas})` : ''}${found.isEstimated ? ' · estimated properties' : ''}` : undefined}
              onInput={(query) => setRow(i, { query })}
            />
            {(reading.suggestions[i]?.length ?? 0) > 0 && (
              <p class="suggestions">
                Did you mean{' '}
                {reading.suggestions[i]!.map((name) => (
                  <button key={name} type="button" class="suggestion" onClick={() => setRow(i, { query: name })}>{name}</button>
                ))}
              </p>
            )}
            <TextField
              label={`Amount of compound ${i + 1}`}
              value={row.amountText}
              problem={p[`row-${i}-amount`]}
              onInput={(amountText) => setRow(i, { amountText })}
              after={<Choice label={`Unit of compound ${i + 1}`} isCompact value={row.unit} options={amountUnits} onChange={(unit) => setRow(i, { unit })} />}
            />
            {form.rows.length > 1 && (
              <button type="button" class="link-button" onClick={() => onChange({ ...form, rows: form.rows.filter((_, k) => k !== i) })}>Remove compound {i + 1}</button>
            )}
          </div>
        );
      })}
      <button type="button" class="action action-quiet" onClick={() => onChange({ ...form, rows: [...form.rows, { query: '', amountText: '', unit: form.rows.at(-1)?.unit ?? 'mL' }] })}>
        Add a compound
      </button>
      {isPercent && (
        <div class="percent-basis">
          <Choice label="Percentages by" value={form.percentBasis} options={[['volume', 'volume'], ['mass', 'mass'], ['mole', 'moles']]} onChange={(percentBasis) => onChange({ ...form, percentBasis })} />
          <TextField label="Whole charge" value={form.totalText} problem={p['total']} onInput={(totalText) => onChange({ ...form, totalText })} after={<span class="unit">mL</span>} />
        </div>
      )}
      {p['charge'] && <p class="field-problem" role="status">{p['charge']}</p>}

      <h3>Your own compounds</h3>
      <p class="hint">For a compound not in the library: its normal boiling point at least. Results that rest on an estimate are marked.</p>
      {form.userCompounds.map((u, i) => (
        <fieldset class="user-compound" key={i}>
          <legend>Own compound {i + 1}</legend>
          <TextField label="Name" inputMode="text" value={u.name} problem={p[`user-${i}-name`]} onInput={(name) => setUser(i, { name })} />
          <TextField
            label="Normal boiling point (at 1 atm)"
            value={u.boilingPointText}
            problem={p[`user-${i}-tb`]}
            onInput={(boilingPointText) => setUser(i, { boilingPointText })}
            after={<Choice label="Boiling point unit" isCompact value={u.boilingPointUnit} options={[['degC', temperatureUnitLabel.degC], ['degF', temperatureUnitLabel.degF]]} onChange={(boilingPointUnit) => setUser(i, { boilingPointUnit })} />}
          />
          <TextField label="Molar mass (optional)" value={u.molarMassText} problem={p[`user-${i}-molar-mass`]} onInput={(molarMassText) => setUser(i, { molarMassText })} after={<span class="unit">g/mol</span>} />
          <TextField label="Density near 20 °C (optional)" value={u.densityText} problem={p[`user-${i}-density`]} onInput={(densityText) => setUser(i, { densityText })} after={<span class="unit">g/mL</span>} />
          <p class="hint">Antoine constants (optional): log10(P) = A − B / (T + C)</p>
          <div class="antoine">
            <TextField label="A" value={u.antoineAText} problem={p[`user-${i}-antoine-a`]} onInput={(antoineAText) => setUser(i, { antoineAText })} />
            <TextField label="B" value={u.antoineBText} problem={p[`user-${i}-antoine-b`]} onInput={(antoineBText) => setUser(i, { antoineBText })} />
            <TextField label="C" value={u.antoineCText} problem={p[`user-${i}-antoine-c`]} onInput={(antoineCText) => setUser(i, { antoineCText })} />
          </div>
          <div class="antoine-units">
            <Choice label="P in" value={u.antoinePressureUnit} options={[['mmHg', 'mmHg'], ['kPa', 'kPa'], ['bar', 'bar'], ['Pa', 'Pa']]} onChange={(antoinePressureUnit) => setUser(i, { antoinePressureUnit })} />
            <Choice label="T in" value={u.antoineTemperatureUnit} options={[['C', '°C'], ['K', 'K']]} onChange={(antoineTemperatureUnit) => setUser(i, { antoineTemperatureUnit })} />
          </div>
          {p[`user-${i}-antoine`] && <p class="field-problem">{p[`user-${i}-antoine`]}</p>}
          <label class="switch">
            <input type="checkbox" checked={u.isHydrogenBonded} onChange={() => setUser(i, { isHydrogenBonded: !u.isHydrogenBonded })} />
            <span>Hydrogen-bonded (an alcohol, acid, amine or water)</span>
          </label>
          <button type="button" class="link-button" onClick={() => onChange({ ...form, userCompounds: form.userCompounds.filter((_, k) => k !== i) })}>Remove own compound {i + 1}</button>
        </fieldset>
      ))}
      <button type="button" class="action action-quiet" onClick={() => onChange({ ...form, userCompounds: [...form.userCompounds, emptyUserCompound(settings.temperatureUnit)] })}>
        Add your own compound
      </button>
    </section>
  );
}
