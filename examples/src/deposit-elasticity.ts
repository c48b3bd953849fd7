/**
 * Elasticity of deposit balances to the offered rate for the invented "Quillfeather Savings" book: compare
 * the four functional forms, then read the log-log slope as the elasticity.
 * Run: LEASTLINE_KEY=... npm run deposit-elasticity -w examples
 */
import { createLeastlineClient } from '@leastline/sdk';
import { CAUTION, connection, normalDraws, seededRandom } from './invented-series';

async function main() {
  const normal = normalDraws(seededRandom(11));
  const offeredRate: number[] = [];
  const balance: number[] = [];
  for (let week = 0; week < 80; week++) {
    const rate = 0.8 + 0.04 * week + 0.05 * normal();
    offeredRate.push(Math.max(rate, 0.2));
    balance.push(Math.exp(6 + 0.6 * Math.log(Math.max(rate, 0.2)) + 0.03 * normal()));
  }
  const client = createLeastlineClient(connection());
  const { data, error } = await client.POST('/v1/form-comparisons', {
    body: {
      data: { columns: { offered_rate: offeredRate, deposit_balance: balance } },
      model: { response: 'deposit_balance', predictors: ['offered_rate'] },
    },
  });
  if (error) throw new Error(`${error.title}: ${error.detail}`);
  console.log('Forms ranked by AIC on the scale of the balances (invented data):');
  for (const row of data.comparison.criteria) {
    console.log(`  ${row.rank}. ${row.form.padEnd(8)} AIC ${row.aic?.toFixed(1) ?? 'n/a'}  R² ${row.rSquared.toFixed(4)}`);
  }
  const logLog = data.comparison.fits['log-log'];
  const effect = logLog?.effects[0];
  if (effect?.elasticity !== null && effect?.elasticity !== undefined) {
    const percent = 100 * (1.01 ** effect.elasticity - 1);
    console.log(`Elasticity (log-log): ${effect.elasticity.toFixed(3)}: a 1% higher offered rate goes with ${percent.toFixed(3)}% higher balances`);
  }
  console.log(CAUTION);
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
