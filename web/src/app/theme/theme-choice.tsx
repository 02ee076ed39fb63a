import { FluentProvider, makeStaticStyles, tokens } from '@fluentui/react-components';
import { createContext, useCallback, useContext, useMemo, useState, type ReactNode } from 'react';
import { ligamentDarkTheme, ligamentLightTheme } from './brand';

export type ThemeChoice = 'light' | 'dark';

interface ThemeChoiceValue {
  readonly choice: ThemeChoice;
  readonly toggle: () => void;
}

const ThemeChoiceContext = createContext<ThemeChoiceValue>({ choice: 'light', toggle: () => undefined });

const STORAGE_KEY = 'ligament.theme';

// Plain router links (tables, activity, details) took the browser's blue and visited purple, which are
// unreadable on the dark theme; they follow the theme's link colours instead. Styled links keep their own.
const useLinkColours = makeStaticStyles({
  // :where() keeps the specificity at zero, so any class (nav links, Fluent's Link) still wins.
  ':where(a:link, a:visited)': { color: tokens.colorBrandForegroundLink },
  ':where(a:link:hover, a:visited:hover)': { color: tokens.colorBrandForegroundLinkHover },
});

function initialChoice(): ThemeChoice {
  try {
    const stored = window.localStorage.getItem(STORAGE_KEY);
    if (stored === 'light' || stored === 'dark') return stored;
  } catch {
    // Storage may be unavailable (private mode); the light theme is the default.
  }
  return 'light';
}

export interface ThemeChoiceProviderProps {
  readonly children: ReactNode;
}

/** FluentProvider with Ligament's light or dark theme, remembered per browser. */
export function ThemeChoiceProvider({ children }: ThemeChoiceProviderProps) {
  useLinkColours();
  const [choice, setChoice] = useState<ThemeChoice>(initialChoice);
  const toggle = useCallback(() => {
    setChoice((previous) => {
      const next = previous === 'dark' ? 'light' : 'dark';
      try {
        window.localStorage.setItem(STORAGE_KEY, next);
      } catch {
        // Not remembered; still applied.
      }
      return next;
    });
  }, []);
  const value = useMemo(() => ({ choice, toggle }), [choice, toggle]);
  return (
    <ThemeChoiceContext.Provider value={value}>
      <FluentProvider
        theme={choice === 'dark' ? ligamentDarkTheme : ligamentLightTheme}
        style={{ minHeight: '100vh' }}
      >
        {children}
      </FluentProvider>
    </ThemeChoiceContext.Provider>
  );
}

export function useThemeChoice(): ThemeChoiceValue {
  return useContext(ThemeChoiceContext);
}
