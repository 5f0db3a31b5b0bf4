// Whether the browser believes it is connected, kept current by its online/offline events.
// `navigator.onLine` can say yes on a dead network, so a failed call is the other signal.
import { useEffect, useState } from 'react';

const browserOnline = () => (typeof navigator === 'undefined' || typeof navigator.onLine !== 'boolean' ? true : navigator.onLine);

export function useOnline(onReturn?: () => void): boolean {
  const [online, setOnline] = useState(browserOnline);
  useEffect(() => {
    if (typeof window === 'undefined' || !window.addEventListener) return;
    const up = () => {
      setOnline(true);
      onReturn?.();
    };
    const down = () => setOnline(false);
    window.addEventListener('online', up);
    window.addEventListener('offline', down);
    return () => {
      window.removeEventListener('online', up);
      window.removeEventListener('offline', down);
    };
  }, [onReturn]);
  return online;
}

export { browserOnline };
