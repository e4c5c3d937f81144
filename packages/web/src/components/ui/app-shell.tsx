import { makeStyles, mergeClasses, Text, tokens } from '@fluentui/react-components';
import type { FluentIcon } from '@fluentui/react-icons';
import type { ReactNode } from 'react';
import { NavLink } from 'react-router-dom';
import { emberAccent } from '@/theme/brand-ramp';
import { BrandMark } from './brand-mark';

const mainContentId = 'main-content';

const useStyles = makeStyles({
  root: {
    minHeight: '100vh',
    display: 'grid',
    gridTemplateColumns: '208px minmax(0, 1fr)',
    gridTemplateRows: 'auto 1fr',
    gridTemplateAreas: '"header header" "nav main"',
    backgroundColor: tokens.colorNeutralBackground1,
    color: tokens.colorNeutralForeground1,
    '@media (max-width: 720px)': {
      gridTemplateColumns: 'minmax(0, 1fr)',
      gridTemplateRows: 'auto auto 1fr',
      gridTemplateAreas: '"header" "nav" "main"',
    },
    // On paper only the page itself: no top bar, no navigation.
    '@media print': { display: 'block', minHeight: 0 },
  },
  noPrint: { '@media print': { display: 'none' } },
  skipLink: {
    position: 'absolute',
    left: '-10000px',
    top: tokens.spacingVerticalS,
    zIndex: 100,
    padding: `${tokens.spacingVerticalS} ${tokens.spacingHorizontalM}`,
    backgroundColor: tokens.colorBrandBackground,
    color: tokens.colorNeutralForegroundOnBrand,
    borderRadius: tokens.borderRadiusMedium,
    fontWeight: tokens.fontWeightSemibold,
    ':focus': {
      left: tokens.spacingHorizontalS,
      outline: `2px solid ${tokens.colorStrokeFocus2}`,
      outlineOffset: '2px',
    },
  },
  header: {
    gridArea: 'header',
    display: 'flex',
    alignItems: 'center',
    gap: tokens.spacingHorizontalM,
    minHeight: '48px',
    padding: `0 ${tokens.spacingHorizontalL}`,
    // The ember accent: a thin bar along the top edge, the console's one warm line.
    borderTop: `3px solid ${emberAccent}`,
    borderBottom: `1px solid ${tokens.colorNeutralStroke2}`,
    backgroundColor: tokens.colorNeutralBackground1,
  },
  identity: {
    display: 'flex',
    alignItems: 'center',
    gap: tokens.spacingHorizontalS,
    minWidth: 0,
  },
  productName: { color: tokens.colorBrandForeground1, letterSpacing: '0.01em' },
  separator: {
    width: '1px',
    height: '18px',
    backgroundColor: tokens.colorNeutralStroke1,
  },
  networkName: {
    color: tokens.colorNeutralForeground2,
    whiteSpace: 'nowrap',
    overflow: 'hidden',
    textOverflow: 'ellipsis',
  },
  headerActions: {
    marginLeft: 'auto',
    display: 'flex',
    alignItems: 'center',
    gap: tokens.spacingHorizontalS,
  },
  nav: {
    gridArea: 'nav',
    padding: `${tokens.spacingVerticalM} ${tokens.spacingHorizontalS}`,
    backgroundColor: tokens.colorNeutralBackground2,
    borderRight: `1px solid ${tokens.colorNeutralStroke2}`,
    '@media (max-width: 720px)': {
      borderRight: 'none',
      borderBottom: `1px solid ${tokens.colorNeutralStroke2}`,
    },
  },
  navList: {
    listStyle: 'none',
    margin: 0,
    padding: 0,
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalXXS,
    '@media (max-width: 720px)': { flexDirection: 'row', flexWrap: 'wrap' },
  },
  navLink: {
    display: 'flex',
    alignItems: 'center',
    gap: tokens.spacingHorizontalS,
    padding: `${tokens.spacingVerticalSNudge} ${tokens.spacingHorizontalM}`,
    borderRadius: tokens.borderRadiusMedium,
    color: tokens.colorNeutralForeground2,
    textDecoration: 'none',
    fontSize: tokens.fontSizeBase300,
    lineHeight: tokens.lineHeightBase300,
    ':hover': {
      backgroundColor: tokens.colorSubtleBackgroundHover,
      color: tokens.colorNeutralForeground1,
    },
    ':focus-visible': {
      outline: `2px solid ${tokens.colorStrokeFocus2}`,
      outlineOffset: '1px',
    },
  },
  navLinkActive: {
    color: tokens.colorBrandForeground1,
    backgroundColor: tokens.colorBrandBackground2,
    fontWeight: tokens.fontWeightSemibold,
    // The active marker: an ember edge, so "you are here" does not rely on the tint alone.
    boxShadow: `inset 3px 0 0 ${emberAccent}`,
    ':hover': {
      backgroundColor: tokens.colorBrandBackground2Hover,
      color: tokens.colorBrandForeground1,
    },
  },
  navIcon: { flexShrink: 0 },
  main: {
    gridArea: 'main',
    minWidth: 0,
    padding: `${tokens.spacingVerticalL} ${tokens.spacingHorizontalXL}`,
    ':focus': { outline: 'none' },
    '@media (max-width: 720px)': { padding: tokens.spacingHorizontalM },
  },
});

export interface AppNavItem {
  label: string;
  to: string;
  icon: FluentIcon;
  /** Match this path exactly, so the home entry is not active on every page. */
  end?: boolean;
}

export interface AppShellProps {
  productName: string;
  networkName: string;
  navItems: AppNavItem[];
  headerActions?: ReactNode;
  children: ReactNode;
}

/** The frame around every page: skip link, top bar, side navigation and the main landmark. */
export function AppShell({
  productName,
  networkName,
  navItems,
  headerActions,
  children,
}: AppShellProps) {
  const styles = useStyles();
  return (
    <div className={styles.root}>
      <a
        href={`#${mainContentId}`}
        className={styles.skipLink}
        onClick={(event) => {
          // Move focus without touching the URL, which the router owns.
          event.preventDefault();
          document.getElementById(mainContentId)?.focus();
        }}
      >
        Skip to content
      </a>
      <header className={mergeClasses(styles.header, styles.noPrint)}>
        <div className={styles.identity}>
          <BrandMark />
          <Text size={500} weight="semibold" className={styles.productName}>
            {productName}
          </Text>
          <span className={styles.separator} aria-hidden="true" />
          <Text size={300} className={styles.networkName}>
            {networkName}
          </Text>
        </div>
        {headerActions ? <div className={styles.headerActions}>{headerActions}</div> : null}
      </header>
      <nav className={mergeClasses(styles.nav, styles.noPrint)} aria-label="Main">
        <ul className={styles.navList}>
          {navItems.map(({ label, to, icon: Icon, end }) => (
            <li key={to}>
              <NavLink
                to={to}
                end={end}
                className={({ isActive }) =>
                  mergeClasses(styles.navLink, isActive && styles.navLinkActive)
                }
              >
                <Icon className={styles.navIcon} aria-hidden="true" />
                {label}
              </NavLink>
            </li>
          ))}
        </ul>
      </nav>
      <main id={mainContentId} className={styles.main} tabIndex={-1}>
        {children}
      </main>
    </div>
  );
}
