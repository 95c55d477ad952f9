import { describe, expect, it } from 'vitest';
import { closestCompoundNames, findCompound, makeUserCompound, UnknownCompoundError } from '../../../src/science/compounds/index.ts';

describe('findCompound', () => {
  it.each([
    ['ethanol', 'ethanol'],
    ['Ethanol', 'ethanol'],
    ['  ETHANOL ', 'ethanol'],
    ['EtOH', 'ethanol'],
    ['64-17-5', 'ethanol'],
    ['64175', 'ethanol'],
    ['n,n-dimethyl formamide', 'N,N-dimethylformamide'],
    ['DMF', 'N,N-dimethylformamide'],
    ['methylene chloride', 'dichloromethane'],
    ['Methyl-Ethyl Ketone', '2-butanone'],
    ['2,2,4-trimethylpentane', 'isooctane'],
    ['138-86-3', 'limonene'],
    ['para xylene', 'p-xylene'],
  ])('findCompound(%j) finds %s', (query, name) => {
    expect(findCompound(query).name).toBe(name);
  });
  it('findCompound("ethanoll") throws with ethanol as the closest match', () => {
    expect(closestCompoundNames('ethanoll')[0]).toBe('ethanol');
    expect(() => findCompound('ethanoll')).toThrow(UnknownCompoundError);
    expect(() => findCompound('ethanoll')).toThrow(/ethanol/);
  });
  it('findCompound("tolune") suggests toluene', () => {
    try {
      findCompound('tolune');
      expect.unreachable();
    } catch (error) {
      expect((error as UnknownCompoundError).suggestions[0]).toBe('toluene');
    }
  });
  it.each(['', '  ', '---'])('findCompound(%j) throws', (q) => {
    expect(() => findCompound(q)).toThrow(UnknownCompoundError);
  });
  it('findCompound searches the chemist\'s own compounds first', () => {
    const mine = makeUserCompound({ name: 'Solvent X', normalBoilingPointK: 400 });
    expect(findCompound('solvent-x', [mine])).toBe(mine);
    expect(closestCompoundNames('solvnt x', [mine])).toContain('Solvent X');
  });
  it('closestCompoundNames("zzzzzz") is empty rather than far-fetched', () => {
    expect(closestCompoundNames('zzzzzz')).toEqual([]);
  });
});
