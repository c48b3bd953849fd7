import { createContext, useCallback, useContext, useEffect, useMemo, useState, type ReactNode } from 'react';

export type Appearance = 'light' | 'dark';

const storageKey = 'leastline.appearance';

type AppearanceContextValue = {
  appearance: Appearance;
  setAppearance: (next: Appearance) => void;
  toggleAppearance: () => void;
};

const AppearanceContext = createContext<AppearanceContextValue | null>(null);

function readStoredAppearance(): Appearance | null {
  try {
    const stored = window.localStorage.getItem(storageKey);
    return stored === 'light' || stored === 'dark' ? stored : null;
  } catch {
    // Storage can be blocked (private modes, strict settings); fall back to the system preference.
    return null;
  }
}

function systemAppearance(): Appearance {
  return window.matchMedia?.('(prefers-color-scheme: dark)').matches ? 'dark' : 'light';
}

export function AppearanceProvider({ children }: { children: ReactNode }) {
  const [appearance, setAppearanceState] = useState<Appearance>(
    () => readStoredAppearance() ?? systemAppearance(),
  );

  // The class on <html> lets the page background and scrollbars follow the theme too,
  // not only the Radix Themes root.
  useEffect(() => {
    const root = document.documentElement;
    root.classList.toggle('dark', appearance === 'dark');
    root.classList.toggle('light', appearance === 'light');
    root.style.colorScheme = appearance;
  }, [appearance]);

  const setAppearance = useCallback((next: Appearance) => {
    setAppearanceState(next);
    try {
      window.localStorage.setItem(storageKey, next);
    } catch {
      // Not remembered across visits when storage is unavailable; the choice still applies now.
    }
  }, []);

  const value = useMemo<AppearanceContextValue>(
    () => ({
      appearance,
      setAppearance,
      toggleAppearance: () => setAppearance(appearance === 'dark' ? 'light' : 'dark'),
    }),
    [appearance, setAppearance],
  );

  return <AppearanceContext.Provider value={value}>{children}</AppearanceContext.Provider>;
}

export function useAppearance(): AppearanceContextValue {
  const value = useContext(AppearanceContext);
  if (value === null) throw new Error('useAppearance must be used inside <AppearanceProvider>');
  return value;
}
