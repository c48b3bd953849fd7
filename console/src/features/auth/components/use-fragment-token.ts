import { useEffect, useState } from 'react';
import { useLocation, useNavigate } from 'react-router-dom';

export function readTokenFromFragment(hash: string): string {
  const fragment = hash.startsWith('#') ? hash.slice(1) : hash;
  return new URLSearchParams(fragment).get('token') ?? '';
}

/**
 * E-mailed links carry their one-time token in the URL fragment (`#token=…`), which browsers never send
 * to a server. The page reads it once, then replaces the address without it, so the token is not left
 * in history or on a shared screen. `rememberAs` keeps it for this tab only, for a detour (signing in)
 * that leaves the page and comes back.
 */
export function useFragmentToken(rememberAs?: string): string {
  const location = useLocation();
  const navigate = useNavigate();
  const [token, setToken] = useState(() => {
    const fromFragment = readTokenFromFragment(location.hash);
    if (rememberAs === undefined || fromFragment !== '') return fromFragment;
    try {
      return window.sessionStorage.getItem(rememberAs) ?? '';
    } catch {
      return '';
    }
  });

  // Also runs when a link is opened while the page is already showing (only the fragment changes).
  useEffect(() => {
    if (location.hash === '') return;
    const fromFragment = readTokenFromFragment(location.hash);
    if (fromFragment !== '') {
      setToken(fromFragment);
      if (rememberAs !== undefined) {
        try {
          window.sessionStorage.setItem(rememberAs, fromFragment);
        } catch {
          // Without storage the token lasts as long as this page does.
        }
      }
    }
    navigate({ pathname: location.pathname, search: location.search }, { replace: true });
  }, [location.hash, location.pathname, location.search, navigate, rememberAs]);

  return token;
}

export function forgetRememberedToken(rememberAs: string) {
  try {
    window.sessionStorage.removeItem(rememberAs);
  } catch {
    // Nothing was stored when storage is unavailable.
  }
}
