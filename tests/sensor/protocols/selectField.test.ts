import { describe, expect, it } from 'vitest';
import { namedValues, selectField, splitColumns } from '../../../src/sensor/protocols/selectField.ts';

describe('selectField', () => {
  it('namedValues keeps a unit suffix with its value and ignores clock times', () => {
    expect(namedValues('at 12:30:05 head: 78.2 degC, cj=21.9')).toEqual([
      { name: 'head', value: '78.2 degC' },
      { name: 'cj', value: '21.9' },
    ]);
  });

  it('splitColumns folds runs of spaces, trims cells of other delimiters, and gives [] for blank', () => {
    expect(splitColumns('  1   2 3 ', ' ')).toEqual(['1', '2', '3']);
    expect(splitColumns('1 ; 2;3', ';')).toEqual(['1', '2', '3']);
    expect(splitColumns('   ', ',')).toEqual([]);
  });

  it('selectField returns undefined for a missing column or name', () => {
    expect(selectField('1,2', { kind: 'column', delimiter: ',', index: 2 })).toBeUndefined();
    expect(selectField('a=1', { kind: 'name', name: 'b' })).toBeUndefined();
    expect(selectField(' 7 ', { kind: 'bare' })).toBe('7');
  });
});
