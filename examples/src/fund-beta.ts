/**
 * A fund's beta to its benchmark (invented: "Tidewater Balanced Fund" against an invented index), with
 * Newey-West standard errors because daily returns are often serially correlated.
 * Run: LEASTLINE_KEY=... npm run fund-beta -w examples
 */
import { createLeastlineClient } from '@leastline/sdk';
import { CAUTION, connection, normalDraws, seededRandom } from './invented-series';

async function main() {
  const normal = normalDraws(seededRandom(7));
  const days = 250;
  const benchmark: number[] = [];
  const fund: number[] = [];
  for (let day = 0; day < days; day++) {
    const market = 0.0003 + 0.011 * normal();
    benchmark.push(market);
    fund.push(0.0001 + 0.85 * market + 0.004 * normal());
  }
  const client = createLeastlineClient(connection());
  const { data, error } = await client.POST('/v1/fits', {
    body: {
      data: { columns: { tidewater_return: fund, index_return: benchmark } },
      model: { response: 'tidewater_return', predictors: ['index_return'] },
      covariance: { type: 'newey-west', lag: 'automatic' },
      diagnostics: ['durbin-watson', 'breusch-pagan', 'jarque-bera'],
    },
  });
  if (error) throw new Error(`${error.title}: ${error.detail}`);
  const beta = data.inference.coefficients.find((row) => row.term === 'index_return');
  if (!beta) throw new Error('no beta in the answer');
  console.log(`Beta of the invented Tidewater fund: ${beta.estimate.toFixed(4)} (Newey-West SE ${beta.standardError.toFixed(4)}, ` +
    `${(data.inference.confidenceLevel * 100).toFixed(0)}% CI ${beta.confidenceInterval.lower.toFixed(4)} to ${beta.confidenceInterval.upper.toFixed(4)})`);
  console.log(`R² ${data.fit.rSquared.toFixed(3)}; result ${data.id}; input hash ${data.inputHash.slice(0, 16)}…; ${data.usage.units} units`);
  console.log(CAUTION);
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
