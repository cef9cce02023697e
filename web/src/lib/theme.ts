/**
 * Light, dark, or following the system. The choice is kept in localStorage;
 * public/theme-init.js applies it before the first paint with the same key.
 */
import { useEffect, useState } from 'react';

export type ThemeChoice = 'system' | 'light' | 'dark';
const KEY = 'fourfold.theme';

function systemDark(): boolean {
  return typeof window.matchMedia === 'function' && window.matchMedia('(prefers-color-scheme: dark)').matches;
}

export function readTheme(): ThemeChoice {
  const saved = localStorage.getItem(KEY);
  return saved === 'light' || saved === 'dark' ? saved : 'system';
}

export function isDark(choice: ThemeChoice): boolean {
  return choice === 'dark' || (choice === 'system' && systemDark());
}

export function useTheme(): [ThemeChoice, (choice: ThemeChoice) => void, boolean] {
  const [choice, setChoice] = useState<ThemeChoice>(readTheme);
  const [dark, setDark] = useState(() => isDark(choice));
  useEffect(() => {
    const apply = () => {
      const d = isDark(choice);
      document.documentElement.classList.toggle('dark', d);
      setDark(d);
    };
    apply();
    if (choice !== 'system' || typeof window.matchMedia !== 'function') return;
    const media = window.matchMedia('(prefers-color-scheme: dark)');
    media.addEventListener('change', apply);
    return () => media.removeEventListener('change', apply);
  }, [choice]);
  const set = (next: ThemeChoice) => {
    if (next === 'system') localStorage.removeItem(KEY);
    else localStorage.setItem(KEY, next);
    setChoice(next);
  };
  return [choice, set, dark];
}
