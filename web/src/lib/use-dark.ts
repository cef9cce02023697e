import { useSyncExternalStore } from 'react';

/** Whether the page is dark right now (the theme switch sets the class on <html>), so the chart draws in the same theme. */
function subscribe(onChange: () => void): () => void {
  const observer = new MutationObserver(onChange);
  observer.observe(document.documentElement, { attributes: true, attributeFilter: ['class'] });
  return () => observer.disconnect();
}

export const useDark = (): boolean =>
  useSyncExternalStore(subscribe, () => document.documentElement.classList.contains('dark'));
