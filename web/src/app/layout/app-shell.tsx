import {
  Avatar,
  Button,
  makeStyles,
  Menu,
  mergeClasses,
  MenuItem,
  MenuList,
  MenuPopover,
  MenuTrigger,
  shorthands,
  Text,
  tokens,
  Tooltip,
} from '@fluentui/react-components';
import {
  DismissRegular,
  NavigationRegular,
  SignOutRegular,
  WeatherMoonRegular,
  WeatherSunnyRegular,
} from '@fluentui/react-icons';
import { Suspense, useState, type KeyboardEvent } from 'react';
import { NavLink, Outlet, useLocation, useMatches, useNavigate } from 'react-router-dom';
import { LogoMark } from '@/components/logo-mark';
import { NotificationBell } from '@/features/notifications/components/notification-bell';
import { LoadingState } from '@/components/states';
import { CAUTION } from 'ligament/engine';
import { paths } from '@/config/paths';
import { signOut } from '@/lib/auth';
import { useServerInfo } from '@/lib/server-info';
import { useSession } from '@/lib/session';
import { useThemeChoice } from '../theme/theme-choice';
import { navItems, roleLabels } from './nav-items';

/** Below this width the navigation folds into a menu button. */
const NARROW = '@media (max-width: 760px)';

const useStyles = makeStyles({
  root: {
    minHeight: '100vh',
    display: 'flex',
    flexDirection: 'column',
    backgroundColor: tokens.colorNeutralBackground2,
  },
  skip: {
    position: 'absolute',
    left: '-10000px',
    ':focus': {
      left: tokens.spacingHorizontalM,
      top: tokens.spacingVerticalS,
      zIndex: 10,
      backgroundColor: tokens.colorNeutralBackground1,
      padding: tokens.spacingHorizontalS,
    },
  },
  header: {
    backgroundColor: tokens.colorBrandBackgroundStatic,
    color: tokens.colorNeutralForegroundOnBrand,
    display: 'flex',
    flexWrap: 'wrap',
    alignItems: 'center',
    columnGap: tokens.spacingHorizontalXL,
    rowGap: tokens.spacingVerticalXS,
    padding: `${tokens.spacingVerticalS} ${tokens.spacingHorizontalXL}`,
    '@media print': { display: 'none' },
    [NARROW]: {
      columnGap: tokens.spacingHorizontalS,
      padding: `${tokens.spacingVerticalS} ${tokens.spacingHorizontalM}`,
    },
  },
  brand: {
    display: 'flex',
    alignItems: 'center',
    gap: tokens.spacingHorizontalS,
    color: 'inherit',
    textDecorationLine: 'none',
    borderRadius: tokens.borderRadiusMedium,
    ':focus-visible': { outline: `2px solid ${tokens.colorNeutralForegroundOnBrand}`, outlineOffset: '2px' },
  },
  wordmark: {
    fontSize: tokens.fontSizeBase500,
    fontWeight: tokens.fontWeightSemibold,
    letterSpacing: '0.02em',
  },
  nav: {
    display: 'flex',
    flexWrap: 'wrap',
    gap: tokens.spacingHorizontalXS,
    flexGrow: 1,
    [NARROW]: { display: 'none' },
  },
  // On a narrow screen the navigation is a list under the header, opened by the menu button.
  navOpen: {
    [NARROW]: {
      display: 'flex',
      flexDirection: 'column',
      order: 3,
      flexBasis: '100%',
      paddingBottom: tokens.spacingVerticalS,
    },
  },
  menuButton: {
    display: 'none',
    color: tokens.colorNeutralForegroundOnBrand,
    ':hover': { color: tokens.colorNeutralForeground1 },
    [NARROW]: { display: 'inline-flex', minWidth: 'auto' },
  },
  navLink: {
    color: tokens.colorNeutralForegroundOnBrand,
    textDecorationLine: 'none',
    padding: `${tokens.spacingVerticalXS} ${tokens.spacingHorizontalM}`,
    borderRadius: tokens.borderRadiusMedium,
    ...shorthands.borderBottom('3px', 'solid', 'transparent'),
    ':hover': { backgroundColor: tokens.colorBrandBackgroundHover },
    ':focus-visible': { outline: `2px solid ${tokens.colorNeutralForegroundOnBrand}`, outlineOffset: '1px' },
  },
  navLinkActive: {
    fontWeight: tokens.fontWeightSemibold,
    ...shorthands.borderBottom('3px', 'solid', tokens.colorPaletteMarigoldBorderActive),
  },
  tools: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalS, marginLeft: 'auto' },
  onBrandButton: {
    color: tokens.colorNeutralForegroundOnBrand,
    ':hover': { color: tokens.colorNeutralForeground1 },
    // Fluent buttons are at least 96 px wide; with the name hidden the avatar needs far less.
    [NARROW]: { minWidth: 'auto' },
  },
  user: {
    display: 'flex',
    flexDirection: 'column',
    lineHeight: tokens.lineHeightBase200,
    textAlign: 'left',
    [NARROW]: { display: 'none' },
  },
  main: {
    flexGrow: 1,
    width: '100%',
    maxWidth: '1440px',
    boxSizing: 'border-box',
    margin: '0 auto',
    padding: `${tokens.spacingVerticalXL} ${tokens.spacingHorizontalXL}`,
    '@media (max-width: 900px)': { padding: `${tokens.spacingVerticalL} ${tokens.spacingHorizontalM}` },
    ':focus': { outlineStyle: 'none' },
  },
  // A workspace page (list beside detail) takes the width of a wide screen instead of leaving it empty.
  mainWorkspace: { maxWidth: '2200px' },
  footer: {
    borderTop: `${tokens.strokeWidthThin} solid ${tokens.colorNeutralStroke2}`,
    backgroundColor: tokens.colorNeutralBackground1,
    color: tokens.colorNeutralForeground2,
    padding: `${tokens.spacingVerticalM} ${tokens.spacingHorizontalXL}`,
    display: 'flex',
    flexWrap: 'wrap',
    justifyContent: 'space-between',
    gap: tokens.spacingHorizontalL,
  },
});

/** What a route may tell the shell through its `handle`. */
export interface ShellHandle {
  readonly layout?: 'page' | 'workspace';
}

function useWorkspaceLayout(): boolean {
  return useMatches().some((m) => (m.handle as ShellHandle | undefined)?.layout === 'workspace');
}

/** Header with the mark and the role's navigation, the page, and the footer carrying the caution. */
export function AppShell() {
  const styles = useStyles();
  const session = useSession();
  const navigate = useNavigate();
  const serverInfo = useServerInfo();
  const { choice, toggle } = useThemeChoice();
  const workspace = useWorkspaceLayout();
  const role = session?.user.role;
  const location = useLocation();
  // The menu stays open on the page it was opened on: following a link closes it.
  const here = `${location.pathname}${location.search}`;
  const [menuOpenAt, setMenuOpenAt] = useState<string | null>(null);
  const menuOpen = menuOpenAt === here;
  const closeOnEscape = (event: KeyboardEvent) => {
    if (event.key === 'Escape' && menuOpen) {
      setMenuOpenAt(null);
      document.getElementById('main-menu-button')?.focus();
    }
  };
  const demo = serverInfo.data?.demo === true;
  const items = navItems.filter((item) => role && item.roles.includes(role) && (!item.demoOnly || demo));

  return (
    <div className={styles.root}>
      <a className={styles.skip} href="#main">
        Skip to content
      </a>
      <header className={styles.header} onKeyDown={closeOnEscape}>
        <NavLink to={paths.home.getHref()} className={styles.brand} aria-label="Ligament home">
          <LogoMark size={30} onBrand />
          <span className={styles.wordmark}>Ligament</span>
        </NavLink>
        <Button
          id="main-menu-button"
          appearance="transparent"
          className={styles.menuButton}
          icon={menuOpen ? <DismissRegular /> : <NavigationRegular />}
          aria-expanded={menuOpen}
          aria-controls="main-navigation"
          onClick={() => setMenuOpenAt(menuOpen ? null : here)}
        >
          Menu
        </Button>
        <nav
          id="main-navigation"
          aria-label="Main"
          className={mergeClasses(styles.nav, menuOpen && styles.navOpen)}
        >
          {items.map((item) => (
            <NavLink
              key={item.href}
              to={item.href}
              onClick={() => setMenuOpenAt(null)}
              className={({ isActive }) =>
                isActive ? `${styles.navLink} ${styles.navLinkActive}` : styles.navLink
              }
            >
              {item.label}
            </NavLink>
          ))}
        </nav>
        <div className={styles.tools}>
          <Tooltip
            content={choice === 'dark' ? 'Use the light theme' : 'Use the dark theme'}
            relationship="label"
          >
            <Button
              appearance="transparent"
              className={styles.onBrandButton}
              icon={choice === 'dark' ? <WeatherSunnyRegular /> : <WeatherMoonRegular />}
              onClick={toggle}
            />
          </Tooltip>
          {session && <NotificationBell signedIn />}
          {session && (
            <Menu>
              <MenuTrigger disableButtonEnhancement>
                <Button
                  appearance="transparent"
                  className={styles.onBrandButton}
                  aria-label={`Account menu for ${session.user.name}`}
                >
                  <Avatar name={session.user.name} size={28} color="neutral" />
                  <span className={styles.user}>
                    <Text size={200} weight="semibold">
                      {session.user.name}
                    </Text>
                    <Text size={100}>{roleLabels[session.user.role]}</Text>
                  </span>
                </Button>
              </MenuTrigger>
              <MenuPopover>
                <MenuList>
                  <MenuItem onClick={() => navigate(paths.account.getHref())}>
                    Account and API tokens
                  </MenuItem>
                  <MenuItem
                    icon={<SignOutRegular />}
                    onClick={() => {
                      void signOut().finally(() => navigate(paths.signIn.getHref(), { replace: true }));
                    }}
                  >
                    Sign out
                  </MenuItem>
                </MenuList>
              </MenuPopover>
            </Menu>
          )}
        </div>
      </header>
      <main id="main" className={mergeClasses(styles.main, workspace && styles.mainWorkspace)} tabIndex={-1}>
        <Suspense fallback={<LoadingState />}>
          <Outlet />
        </Suspense>
      </main>
      <footer className={styles.footer}>
        <Text size={200}>{CAUTION}</Text>
        <Text size={200}>{serverInfo.data ? `Engine ${serverInfo.data.engineVersion}` : 'Ligament'}</Text>
      </footer>
    </div>
  );
}
