import { roundTo, seededNormal, seededUniform } from '@/features/playground/model/seeded-random';

// Sample requests for the playground. Every company, series and number here is invented: the columns
// are drawn from a seeded generator, so the samples look alike for every visitor and on every reload.

function range(count: number): number[] {
  return Array.from({ length: count }, (_, index) => index);
}

/** Harbourline Pay (invented card processor): chargeback rate of 32 merchants against their average ticket. */
export function chargebackSample() {
  const uniform = seededUniform(20_241);
  const noise = seededNormal(20_242);
  const ticket = range(32).map(() => roundTo(12 + uniform() * 140, 2));
  const chargebackBasisPoints = ticket.map((size) => roundTo(18 + 0.21 * size + noise() * (4 + size * 0.04), 2));
  return {
    data: { columns: { chargeback_bps: chargebackBasisPoints, avg_ticket_eur: ticket } },
    model: { response: 'chargeback_bps', predictors: ['avg_ticket_eur'], form: 'lin-lin' },
    covariance: { type: 'hc3' },
    diagnostics: 'all',
    includeObservations: true,
  };
}

/** Brackenfield Savings (invented bank): balances of 28 savings products against the rate each one offers. */
export function depositSample() {
  const uniform = seededUniform(31_337);
  const noise = seededNormal(31_338);
  const offeredRate = range(28).map(() => roundTo(0.5 + uniform() * 4, 2));
  const balance = offeredRate.map((rate) => roundTo(Math.exp(2.2 + 0.42 * rate + noise() * 0.12), 2));
  return {
    data: { columns: { deposit_balance_musd: balance, offered_rate_pct: offeredRate } },
    model: { response: 'deposit_balance_musd', predictors: ['offered_rate_pct'] },
    forms: ['lin-lin', 'log-lin', 'lin-log', 'log-log'],
  };
}

/** Tidewater Card (invented issuer): monthly interchange income against card spend, predicted at two spend levels. */
export function interchangeSample() {
  const uniform = seededUniform(7_001);
  const noise = seededNormal(7_002);
  const spend = range(24).map(() => roundTo(20 + uniform() * 90, 1));
  const interchange = spend.map((value) => roundTo(0.9 + 0.0165 * value + noise() * 0.08, 3));
  return {
    data: { columns: { interchange_musd: interchange, card_spend_musd: spend } },
    model: { response: 'interchange_musd', predictors: ['card_spend_musd'] },
    points: [[40], [95]],
    confidenceLevel: 0.9,
  };
}

/** Fernhill Asset Partners (invented): three funds' monthly returns against one benchmark, 36 months. */
export function fundBatchSample() {
  const market = seededNormal(4_040);
  const noise = seededNormal(4_041);
  const benchmark = range(36).map(() => roundTo(0.006 + market() * 0.035, 5));
  const fund = (alpha: number, beta: number, spread: number) =>
    benchmark.map((value) => roundTo(alpha + beta * value + noise() * spread, 5));
  return {
    data: {
      columns: {
        fernhill_growth: fund(0.001, 1.18, 0.008),
        fernhill_income: fund(0.0015, 0.62, 0.005),
        fernhill_balanced: fund(0.0005, 0.91, 0.006),
        benchmark,
      },
    },
    responses: ['fernhill_growth', 'fernhill_income', 'fernhill_balanced'],
    predictors: ['benchmark'],
  };
}

/** Larkspur Capital (invented): 160 daily fund returns against a benchmark whose sensitivity drifts upward. */
export function rollingBetaSample() {
  const market = seededNormal(8_080);
  const noise = seededNormal(8_081);
  const days = 160;
  const benchmark = range(days).map(() => roundTo(market() * 0.011, 5));
  const fund = benchmark.map((value, day) => roundTo(0.0002 + (0.8 + (0.5 * day) / days) * value + noise() * 0.004, 5));
  return {
    data: { columns: { larkspur_fund: fund, benchmark } },
    model: { response: 'larkspur_fund', predictors: ['benchmark'] },
    window: 40,
    step: 4,
  };
}
