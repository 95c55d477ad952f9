import { pressureUnitSettings, type Settings } from '../../store/index.ts';
import { formatPressureSetting, temperatureUnitLabel, type DecimalSeparator } from '../units/index.ts';
import { Choice, TextField } from './Field.tsx';
import type { LearnedColumn } from './learnedColumns.ts';
import { heatSources, type ColumnKind, type HeatSource, type PrepareForm, type PressureMethod } from './prepareForm.ts';
import { packingChoices, packingLabel, type FormReading } from './readPrepareForm.ts';

interface SectionProps {
  form: PrepareForm;
  reading: FormReading;
  settings: Settings;
  separator: DecimalSeparator;
  onChange(form: PrepareForm): void;
}

const pressureMethods: ReadonlyArray<readonly [PressureMethod, string]> = [
  ['barometer', 'Barometer in the lab'],
  ['altitude', 'Lab altitude only'],
  ['sea-level', 'Weather report and altitude'],
];

/** The lab's pressure, three ways, with the check for a sea-level value typed as a reading. */
export function PressureSection({ form, reading, settings, separator, onChange }: SectionProps) {
  const pressure = form.pressure;
  const set = (change: Partial<PrepareForm['pressure']>) => onChange({ ...form, pressure: { ...pressure, ...change } });
  const p = reading.problems;
  const altitude = (
    <TextField
      label={pressure.method === 'barometer' ? 'Lab altitude (optional, lets Cutbell check the reading)' : 'Lab altitude'}
      value={pressure.altitudeText}
      problem={p['pressure-altitude']}
      onInput={(altitudeText) => set({ altitudeText })}
      after={<Choice label="Altitude unit" isCompact value={pressure.altitudeUnit} options={[['m', 'm'], ['ft', 'ft']]} onChange={(altitudeUnit) => set({ altitudeUnit })} />}
    />
  );
  return (
    <section class="prepare-section" aria-labelledby="pressure-title">
      <h2 id="pressure-title">Lab pressure</h2>
      <Choice label="From" value={pressure.method} options={pressureMethods} onChange={(method) => set({ method })} />
      {pressure.method !== 'altitude' && (
        <TextField
          label={pressure.method === 'barometer' ? 'Barometer reading' : 'Sea-level pressure from the weather report'}
          value={pressure.valueText}
          problem={p['pressure-value']}
          onInput={(valueText) => set({ valueText })}
          after={<Choice label="Pressure unit" isCompact value={pressure.unit} options={pressureUnitSettings.map((u) => [u, u] as const)} onChange={(unit) => set({ unit })} />}
        />
      )}
      {altitude}
      {reading.pressure && (
        <p class="notice" data-testid="lab-pressure">
          {formatPressureSetting(reading.pressure.pPa, settings.pressureUnit, separator)}: {reading.pressure.how}.
        </p>
      )}
      {reading.pressure?.warning && <p class="warning" role="status">{reading.pressure.warning}</p>}
    </section>
  );
}

const columnKinds: ReadonlyArray<readonly [ColumnKind, string]> = [
  ['none', 'No column (still head only)'],
  ['indented', 'Indented (Vigreux) column'],
  ['packed', 'Packed column'],
  ['learned', 'A column learned from earlier runs'],
];

/** The column: nothing, an indented or packed column with its height, or one learned from runs. */
export function ColumnSection({ form, reading, separator, onChange, learned }: SectionProps & { learned: readonly LearnedColumn[] }) {
  const column = form.column;
  const set = (change: Partial<PrepareForm['column']>) => onChange({ ...form, column: { ...column, ...change } });
  const p = reading.problems;
  return (
    <section class="prepare-section" aria-labelledby="column-title">
      <h2 id="column-title">Column</h2>
      <Choice label="Kind of column" value={column.kind} options={columnKinds} onChange={(kind) => set({ kind, learnedId: kind === 'learned' && !column.learnedId ? (learned[0]?.id ?? '') : column.learnedId })} />
      {column.kind === 'packed' && (
        <Choice label="Packing" value={column.packing} options={packingChoices.map((k) => [k, packingLabel(k)] as const)} onChange={(packing) => set({ packing })} />
      )}
      {(column.kind === 'indented' || column.kind === 'packed') && (
        <TextField label="Height of the indented or packed part" value={column.heightText} problem={p['column-height']} onInput={(heightText) => set({ heightText })} after={<span class="unit">cm</span>} />
      )}
      {column.kind === 'learned' && (
        learned.length > 0
          ? <Choice label="Learned column" value={column.learnedId} options={learned.map((c) => [c.id, `${c.description}: ${c.plates.toFixed(1).replace('.', separator)} plates`] as const)} onChange={(learnedId) => set({ learnedId })} />
          : <p class="field-problem">{p['column-learned'] ?? 'No column learned yet.'}</p>
      )}
      {reading.column && <p class="hint" data-testid="column-plates">{reading.column.description}</p>}
    </section>
  );
}

/** The heat source and the hottest it gets (the autoignition caution depends on it). */
export function HeatSection({ form, reading, onChange }: SectionProps) {
  const heat = form.heat;
  const set = (change: Partial<PrepareForm['heat']>) => onChange({ ...form, heat: { ...heat, ...change } });
  return (
    <section class="prepare-section" aria-labelledby="heat-title">
      <h2 id="heat-title">Heat</h2>
      <Choice label="Heat source" value={heat.source} options={Object.entries(heatSources) as Array<[HeatSource, string]>} onChange={(source) => set({ source })} />
      <TextField
        label="Highest temperature it reaches (optional)"
        value={heat.maxText}
        problem={reading.problems['heat-max']}
        hint="The setting or the surface temperature; compared with each compound’s autoignition temperature."
        onInput={(maxText) => set({ maxText })}
        after={<Choice label="Heat temperature unit" isCompact value={heat.maxUnit} options={[['degC', temperatureUnitLabel.degC], ['degF', temperatureUnitLabel.degF]]} onChange={(maxUnit) => set({ maxUnit })} />}
      />
    </section>
  );
}
