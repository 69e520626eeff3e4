import { useState } from 'react';

export type BoardScheme = 'dark' | 'light';
const KEY = 'jarday-board-scheme';

/**
 * The board's own colour scheme, dim by default for a steamy kitchen and kept per device. It is applied as the
 * theme's class on the board's root, so the rest of the app keeps the scheme chosen there.
 */
export function useBoardScheme(): [BoardScheme, () => void] {
  const [scheme, setScheme] = useState<BoardScheme>(() => {
    try {
      return window.localStorage.getItem(KEY) === 'light' ? 'light' : 'dark';
    } catch {
      return 'dark';
    }
  });
  const toggle = () =>
    setScheme((s) => {
      const next = s === 'dark' ? 'light' : 'dark';
      try {
        window.localStorage.setItem(KEY, next);
      } catch {
        // A locked-down browser keeps the choice for this visit only.
      }
      return next;
    });
  return [scheme, toggle];
}
