import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { readGasDeclaration } from './gas-declaration.ts';

const example = (name: string) => readFileSync(new URL(`../../examples/dyno/${name}`, import.meta.url), 'utf8');

describe('readGasDeclaration', () => {
  it('reads the example files: the raw record includes the gas force, the peak table has it removed', () => {
    expect(readGasDeclaration(example('pipit-front-sine-record.csv'))).toMatchObject({ says: 'included', line: 2 });
    expect(readGasDeclaration(example('pipit-front-peaks.csv'))).toMatchObject({ says: 'removed', line: 2 });
  });

  it.each([
    ['# readings include the gas force', 'included'],
    ['# Gas force: included', 'included'],
    ['// gas spring in readings', 'included'],
    ['# gas = yes', 'included'],
    ['# gas force not included', 'removed'],
    ['# forces net of gas force', 'removed'],
    ['# gas offset subtracted by the rig', 'removed'],
    ['# Gas force: removed', 'removed'],
    ['# without gas', 'removed'],
  ])('%s → %s', (line, says) => {
    expect(readGasDeclaration(`${line}\nvelocity [m/s],force [N]\n0.1,100\n`)?.says).toBe(says);
  });

  it('says nothing when the preamble does not mention gas, and never reads past the column header', () => {
    expect(readGasDeclaration('# unit PF-0001\nvelocity [m/s],force [N]\n0.1,100\n')).toBeNull();
    expect(readGasDeclaration('velocity [m/s],force [N]\n# gas force included\n0.1,100\n')).toBeNull();
  });
});
