/** The variables the test runner provides; a missing one stops the suite with its name. */
export const requiredVariables = [
  'LEASTLINE_DATABASE_URL',
  'LEASTLINE_SESSION_SECRET',
  'LEASTLINE_KEY_PEPPER',
  'LEASTLINE_SMTP_URL',
  'LEASTLINE_CONSOLE_DIST',
] as const;

export function readTestEnvironment(): Record<(typeof requiredVariables)[number], string> {
  const missing = requiredVariables.filter((name) => !process.env[name]);
  if (missing.length > 0) {
    throw new Error(`System tests need ${missing.join(', ')}; run them through "npm test" or set them by hand.`);
  }
  return Object.fromEntries(requiredVariables.map((name) => [name, process.env[name] as string])) as Record<
    (typeof requiredVariables)[number],
    string
  >;
}

/** The seeded invented demo team (see the API's seed); every account shares one password. */
export const demoTeamName = 'Quillfeather Payments (invented demo team)';
export const demoPassword = 'quillfeather-demo-pass';
export const demoAccounts = {
  owner: 'olu.owner@quillfeather.example.test',
  admin: 'ada.admin@quillfeather.example.test',
  developer: 'dana.developer@quillfeather.example.test',
  billing: 'bea.billing@quillfeather.example.test',
} as const;
export type DemoRole = keyof typeof demoAccounts;
