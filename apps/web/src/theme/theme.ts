import { Classes } from '@blueprintjs/core';
import { useSyncExternalStore } from 'react';

export type Theme = 'light' | 'dark';

const STORAGE_KEY = 'tressury.theme';
const listeners = new Set<() => void>();

function initialTheme(): Theme {
  const saved = localStorage.getItem(STORAGE_KEY);
  if (saved === 'light' || saved === 'dark') return saved;
  return window.matchMedia?.('(prefers-color-scheme: dark)').matches ? 'dark' : 'light';
}

let current: Theme = initialTheme();

// Blueprint's dark styles follow Classes.DARK; our tokens follow data-theme. Both sit on <body>
// so overlays portalled into it (dialogs, toasts) take the theme too.
function apply(theme: Theme): void {
  document.body.classList.toggle(Classes.DARK, theme === 'dark');
  document.body.dataset.theme = theme;
}

apply(current);

export function setTheme(theme: Theme): void {
  current = theme;
  localStorage.setItem(STORAGE_KEY, theme);
  apply(theme);
  for (const listener of listeners) listener();
}

export function useTheme(): Theme {
  return useSyncExternalStore(
    (listener) => {
      listeners.add(listener);
      return () => listeners.delete(listener);
    },
    () => current,
  );
}
