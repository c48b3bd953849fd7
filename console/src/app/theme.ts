import type { ThemeProps } from '@radix-ui/themes';

// Deep jade on warm sand: the console's palette. Only these colours' tokens are bundled
// (see main.tsx), so a new accent or gray also needs its token file imported there.
export const brandTheme = {
  accentColor: 'jade',
  grayColor: 'sand',
  radius: 'small',
  scaling: '100%',
  panelBackground: 'solid',
} satisfies Partial<ThemeProps>;
