import { describe, expect, it } from 'vitest';
import { MemoryStore } from '../../../src/store/index.ts';
import { emptyPrepareForm, type PrepareForm } from '../../../src/ui/prepare/prepareForm.ts';
import { deleteTemplate, formFromTemplate, loadTemplates, saveTemplate } from '../../../src/ui/prepare/templates.ts';

function commaForm(): PrepareForm {
  const form = emptyPrepareForm('degC', 'mmHg');
  form.title = 'Recover ethyl acetate';
  form.rows = [{ query: 'ethyl acetate', amountText: '62,5', unit: 'mL' }, { query: 'butyl acetate', amountText: '37,5', unit: 'mL' }];
  form.pressure = { ...form.pressure, valueText: '748,2' };
  form.column = { ...form.column, kind: 'packed', heightText: '25,5' };
  return form;
}

describe('plan templates', () => {
  it('saveTemplate then loadTemplates round-trips under [\'template\', id], numbers kept with a point inside', async () => {
    const store = new MemoryStore();
    await saveTemplate(store, { id: 't1', name: ' Ester recovery ', savedAt: '2026-11-02T10:00:00.000Z', form: commaForm() }, ',');
    expect(await store.keys()).toEqual([['template', 't1']]);
    const [saved] = await loadTemplates(store);
    expect(saved!.name).toBe('Ester recovery');
    expect(saved!.form.rows[0]!.amountText).toBe('62.5');
    expect(formFromTemplate(saved!, ',')).toEqual(commaForm());
    expect(formFromTemplate(saved!, '.').pressure.valueText).toBe('748.2');
  });

  it('saveTemplate with the same id overwrites; deleteTemplate removes it', async () => {
    const store = new MemoryStore();
    await saveTemplate(store, { id: 't1', name: 'A', savedAt: '2026-11-02T10:00:00.000Z', form: commaForm() }, ',');
    await saveTemplate(store, { id: 't1', name: 'B', savedAt: '2026-11-02T11:00:00.000Z', form: commaForm() }, ',');
    expect((await loadTemplates(store)).map((t) => t.name)).toEqual(['B']);
    await deleteTemplate(store, 't1');
    expect(await loadTemplates(store)).toEqual([]);
  });

  it('loadTemplates lists by name and skips records that are not templates', async () => {
    const store = new MemoryStore();
    await saveTemplate(store, { id: 'b', name: 'Toluene dry', savedAt: '2026-11-02T10:00:00.000Z', form: commaForm() }, '.');
    await saveTemplate(store, { id: 'a', name: 'Acetone wash', savedAt: '2026-11-02T10:00:00.000Z', form: commaForm() }, '.');
    await store.setMany([[['template', 'junk'], { name: 3 }], [['settings'], { speech: true }]]);
    expect((await loadTemplates(store)).map((t) => t.id)).toEqual(['a', 'b']);
  });

  it('saveTemplate refuses a blank name and writes nothing', async () => {
    const store = new MemoryStore();
    await expect(saveTemplate(store, { id: 'x', name: '  ', savedAt: '2026-11-02T10:00:00.000Z', form: commaForm() }, ',')).rejects.toThrow(/name/);
    expect(await store.keys()).toEqual([]);
  });

  it('formFromTemplate fills parts an older template lacks from an empty form', () => {
    const partial = { id: 'old', name: 'old', savedAt: '2026-01-01T00:00:00.000Z', version: 1 as const, form: { rows: [{ query: 'water', amountText: '10', unit: 'mL' }] } as unknown as PrepareForm };
    const form = formFromTemplate(partial, '.');
    expect(form.rows[0]!.query).toBe('water');
    expect(form.column.kind).toBe('none');
    expect(form.userCompounds).toEqual([]);
  });
});
