/**
 * A rolling hedge ratio between two invented instruments ("Harbour Grain future" and "Harbour Grain spot"),
 * 60-observation windows moving 20 at a time.
 * Run: LEASTLINE_KEY=... npm run rolling-hedge-ratio -w examples
 */
import { createLeastlineClient } from '@leastline/sdk';
import { CAUTION, connection, normalDraws, seededRandom } from './invented-series';

async function main() {
  const normal = normalDraws(seededRandom(23));
  const spot: number[] = [];
  const future: number[] = [];
  for (let t = 0; t < 300; t++) {
    const hedge = 0.9 + 0.1 * Math.sin(t / 50);
    const change = 0.8 * normal();
    future.push(change);
    spot.push(hedge * change + 0.2 * normal());
  }
  const client = createLeastlineClient(connection());
  const { data, error } = await client.POST('/v1/rolling-fits', {
    body: {
      data: { columns: { spot_change: spot, future_change: future } },
      model: { response: 'spot_change', predictors: ['future_change'] },
      window: 60,
      step: 20,
    },
  });
  if (error) throw new Error(`${error.title}: ${error.detail}`);
  const path = data.rolling.coefficientPath.find((entry) => entry.term === 'future_change');
  if (!path) throw new Error('no hedge ratio path in the answer');
  console.log('Rolling hedge ratio (invented instruments):');
  path.estimates.forEach((estimate, index) => {
    const start = data.rolling.windowStart[index] ?? 0;
    console.log(`  rows ${String(start).padStart(3)}–${start + data.rolling.windowLength - 1}: ${estimate.toFixed(3)} ± ${(path.standardErrors[index] ?? 0).toFixed(3)}`);
  });
  console.log(CAUTION);
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
