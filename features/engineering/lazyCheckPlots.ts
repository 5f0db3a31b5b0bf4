// The check plots, loaded apart from the first screen (see checkPlots.ts). `loadCheckPlots` starts
// the fetch early, e.g. when the filing form opens, so the plots are there, even without a
// connection, by the time the figures are typed. Until the chunk has come, and if it cannot come
// (offline), a check shows without its plots rather than failing; it is asked for again the next
// time a check is shown.
import { useEffect, useState } from 'react';

type CheckPlots = typeof import('./checkPlots');

let loaded: CheckPlots | null = null;

export function loadCheckPlots(): Promise<CheckPlots | null> {
  return import('./checkPlots').then(
    (plots) => (loaded = plots),
    () => null,
  );
}

export function useCheckPlots(): CheckPlots | null {
  const [plots, setPlots] = useState(loaded);
  useEffect(() => {
    if (plots) return;
    let mounted = true;
    void loadCheckPlots().then((p) => {
      if (mounted && p) setPlots(p);
    });
    return () => {
      mounted = false;
    };
  }, [plots]);
  return plots;
}
