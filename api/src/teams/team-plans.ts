/** Plans a team can be on. Billing will attach prices and limits to these names. */
export const TEAM_PLANS = ['starter', 'growth', 'scale'] as const;
export type TeamPlan = (typeof TEAM_PLANS)[number];
