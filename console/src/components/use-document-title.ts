import { useEffect } from 'react';

// Each page names itself so the browser tab and screen readers announce where the user landed.
export function useDocumentTitle(pageTitle: string) {
  useEffect(() => {
    document.title = `${pageTitle} · Leastline`;
  }, [pageTitle]);
}
