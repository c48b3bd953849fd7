import { createHash } from 'node:crypto';
import { canonicalJson, inputHash } from './input-hash';

describe('inputHash', () => {
  const spec = { model: { response: 'y', predictors: ['x'] }, confidenceLevel: 0.95 };
  const numeric = { y: Float64Array.from([1, 2, 3]), x: Float64Array.from([4, 5, 6]) };

  it('ignores key order in the specification and column order', () => {
    const reordered = { confidenceLevel: 0.95, model: { predictors: ['x'], response: 'y' } };
    expect(inputHash(reordered, { x: numeric.x, y: numeric.y })).toBe(inputHash(spec, numeric));
  });

  it('changes when one value changes in the last bit', () => {
    const nudged = Float64Array.from([1, 2, 3 + 4.440892098500626e-16]);
    expect(inputHash(spec, { ...numeric, y: nudged })).not.toBe(inputHash(spec, numeric));
  });

  it('is SHA-256 hex (64 characters), as computed independently with node:crypto', () => {
    const expected = createHash('sha256').update(canonicalJson({})).digest('hex');
    expect(inputHash({}, {})).toBe(expected);
  });
});
