import type { KeyValueStore } from '../../store/index.ts';
import { switchDecimalMark, type DecimalSeparator } from '../units/index.ts';
import { emptyPrepareForm, type PrepareForm } from './prepareForm.ts';

/** A saved plan: the Prepare form as a recipe. Windows are planned again for the day's pressure. */
export interface PlanTemplate {
  id: string;
  name: string;
  /** ISO 8601 */
  savedAt: string;
  version: 1;
  /** The form with numbers written with '.', whatever the phone's decimal mark. */
  form: PrepareForm;
}

export const templateKey = (id: string) => ['template', id];

/** Every number typed in the form, rewritten by `change` (the rest left as it is). */
export function mapNumberTexts(form: PrepareForm, change: (text: string) => string): PrepareForm {
  return {
    ...form,
    rows: form.rows.map((r) => ({ ...r, amountText: change(r.amountText) })),
    totalText: change(form.totalText),
    userCompounds: form.userCompounds.map((u) => ({
      ...u,
      boilingPointText: change(u.boilingPointText),
      molarMassText: change(u.molarMassText),
      densityText: change(u.densityText),
      antoineAText: change(u.antoineAText),
      antoineBText: change(u.antoineBText),
      antoineCText: change(u.antoineCText),
    })),
    pressure: { ...form.pressure, valueText: change(form.pressure.valueText), altitudeText: change(form.pressure.altitudeText) },
    column: { ...form.column, heightText: change(form.column.heightText) },
    heat: { ...form.heat, maxText: change(form.heat.maxText) },
  };
}

/** Saves the form under ['template', id]; the same id overwrites. */
export async function saveTemplate(store: KeyValueStore, template: { id: string; name: string; savedAt: string; form: PrepareForm }, separator: DecimalSeparator): Promise<PlanTemplate> {
  const name = template.name.trim();
  if (name === '') throw new RangeError('give the template a name');
  const saved: PlanTemplate = { id: template.id, name, savedAt: template.savedAt, version: 1, form: mapNumberTexts(template.form, (t) => switchDecimalMark(t, separator, '.')) };
  await store.setMany([[templateKey(template.id), saved]]);
  return saved;
}

function isTemplate(value: unknown): value is PlanTemplate {
  const t = value as Partial<PlanTemplate> | null;
  return typeof t === 'object' && t !== null && typeof t.id === 'string' && typeof t.name === 'string' && typeof t.form === 'object' && t.form !== null && Array.isArray(t.form.rows);
}

/** Every saved template, by name; records that are not templates are skipped. */
export async function loadTemplates(store: KeyValueStore): Promise<PlanTemplate[]> {
  const keys = (await store.keys()).filter((k) => Array.isArray(k) && k.length === 2 && k[0] === 'template');
  const values = await store.getMany<unknown>(keys);
  return values.filter(isTemplate).sort((a, b) => a.name.localeCompare(b.name));
}

export function deleteTemplate(store: KeyValueStore, id: string): Promise<void> {
  return store.delMany([templateKey(id)]);
}

/** The template's form for this phone: missing parts filled from an empty form, numbers in the local mark. */
export function formFromTemplate(template: PlanTemplate, separator: DecimalSeparator): PrepareForm {
  const empty = emptyPrepareForm(template.form.heat?.maxUnit ?? 'degC', template.form.pressure?.unit ?? 'kPa');
  const form: PrepareForm = {
    ...empty,
    ...template.form,
    pressure: { ...empty.pressure, ...template.form.pressure },
    column: { ...empty.column, ...template.form.column },
    heat: { ...empty.heat, ...template.form.heat },
    userCompounds: template.form.userCompounds ?? [],
  };
  return mapNumberTexts(form, (t) => switchDecimalMark(t, '.', separator));
}
