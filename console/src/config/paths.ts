// Route paths of the console, in one place so links and routes cannot drift apart.
export const paths = {
  overview: '/',
  playground: '/playground',
  datasets: '/datasets',
  apiKeys: '/api-keys',
  team: '/team',
  usage: '/usage',
  billing: '/billing',
  signIn: '/sign-in',
} as const;
