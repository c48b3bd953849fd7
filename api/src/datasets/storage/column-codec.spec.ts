import { decodeNumericChunk, decodeTextChunk, encodeNumericChunk, encodeTextChunk } from './column-codec';

describe('column codec', () => {
  it('round-trips float64 values bit for bit, including NaN, -0 and subnormals', () => {
    const values = Float64Array.from([1.5, Number.NaN, -0, 5e-324, 1.7976931348623157e308, -123.456]);
    const target = new Float64Array(8);
    const written = decodeNumericChunk(encodeNumericChunk(values.subarray(0, 6)), target, 2);
    expect(written).toBe(6);
    expect(Object.is(target[4], -0)).toBe(true);
    expect(Number.isNaN(target[3]!)).toBe(true);
    expect(Array.from(target.subarray(5, 8))).toEqual([5e-324, 1.7976931348623157e308, -123.456]);
  });

  it('encodes a subarray view without the rest of its buffer', () => {
    const whole = Float64Array.from([1, 2, 3, 4]);
    expect(encodeNumericChunk(whole.subarray(1, 3)).byteLength).toBe(16);
  });

  it('round-trips text with nulls', () => {
    expect(decodeTextChunk(encodeTextChunk(['north', null, 'Ø-desk']))).toEqual(['north', null, 'Ø-desk']);
  });
});
