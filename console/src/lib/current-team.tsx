import { createContext, useContext, type ReactNode } from 'react';
import type { components } from '@/lib/api-schema';

type Team = components['schemas']['TeamDto'];
type Account = components['schemas']['AccountDto'];

export type CurrentTeam = {
  team: Team;
  account: Account;
};

const CurrentTeamContext = createContext<CurrentTeam | null>(null);

// The team chosen in the address (/teams/:teamId/…) and the signed-in account, provided once by the
// team layout so every page below it reads the same values.
export function CurrentTeamProvider({ value, children }: { value: CurrentTeam; children: ReactNode }) {
  return <CurrentTeamContext.Provider value={value}>{children}</CurrentTeamContext.Provider>;
}

export function useCurrentTeam(): CurrentTeam {
  const value = useContext(CurrentTeamContext);
  if (value === null) throw new Error('useCurrentTeam must be used inside a team page');
  return value;
}
