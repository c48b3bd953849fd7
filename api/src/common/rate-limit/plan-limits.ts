/**
 * Requests per minute for each plan, per API key and per team (all of a team's keys together). The one
 * table the rate limiter reads; billing shows the same numbers.
 */
export const PLAN_NAMES = ['trial', 'starter', 'growth', 'scale'] as const;
export type PlanName = (typeof PLAN_NAMES)[number];

export interface PlanLimits {
  perKeyPerMinute: number;
  perTeamPerMinute: number;
  /** Included units per calendar month (metering reports usage against it). */
  monthlyUnits: number;
}

export const PLAN_LIMITS: Record<PlanName, PlanLimits> = {
  trial: { perKeyPerMinute: 5, perTeamPerMinute: 8, monthlyUnits: 500 },
  starter: { perKeyPerMinute: 60, perTeamPerMinute: 120, monthlyUnits: 10_000 },
  growth: { perKeyPerMinute: 600, perTeamPerMinute: 1_200, monthlyUnits: 250_000 },
  scale: { perKeyPerMinute: 3_000, perTeamPerMinute: 6_000, monthlyUnits: 5_000_000 },
};

export function limitsForPlan(plan: string | undefined): PlanLimits {
  return PLAN_LIMITS[(PLAN_NAMES as readonly string[]).includes(plan ?? '') ? (plan as PlanName) : 'starter'];
}

export const RATE_LIMIT_WINDOW_MS = 60_000;
