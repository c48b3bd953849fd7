import { parsePlainNumber } from './column-builder';

describe('parsePlainNumber', () => {
  it.each([
    ['12', 12],
    ['-3.5', -3.5],
    ['+.5', 0.5],
    ['1e-3', 0.001],
    ['007', 7],
  ])('reads %s as %d', (cell, expected) => {
    expect(parsePlainNumber(cell)).toBe(expected);
  });

  it.each(['0x10', '0b1', '0o7', 'Infinity', '-Infinity', 'NaN', '1,5', '12 apples', '1_000', '--1'])('refuses %s', (cell) => {
    expect(Number.isNaN(parsePlainNumber(cell))).toBe(true);
  });
});
