import type { ReactNode } from 'react';
import { Link as RouterLink, NavLink } from 'react-router-dom';
import { BrandMark } from '../brand/brand-mark';
import { OnTheWaterNotice } from '../safety/on-the-water-notice';
import { SendQueueBadge } from '../send-queue/send-queue-badge';
import { paths } from '../../config/paths';
import { AccountMenu } from './account-menu';
import { CrewSwitcher, type CrewChoice } from './crew-switcher';
import styles from './app-shell.module.css';

export interface AppShellProps {
  userId: string;
  displayName: string;
  email: string;
  isSiteAdmin: boolean;
  crews: CrewChoice[];
  currentCrewId?: string;
  onSignOut: () => void;
  children: ReactNode;
}

/** The frame of every signed-in screen: header (mark, crew switcher, links, account menu), content, cautions. */
export function AppShell({
  userId,
  displayName,
  email,
  isSiteAdmin,
  crews,
  currentCrewId,
  onSignOut,
  children,
}: AppShellProps) {
  return (
    <div className={styles.shell}>
      <a href="#main" className={styles.skipLink}>
        Skip to content
      </a>
      <header className={styles.header}>
        <div className={styles.headerInner}>
          <RouterLink to={paths.home.href()} className={styles.brand}>
            <BrandMark size={30} />
            <span className={styles.brandName}>Shoalbook</span>
          </RouterLink>
          <nav aria-label="Main" className={styles.nav}>
            <CrewSwitcher crews={crews} currentCrewId={currentCrewId} />
            {isSiteAdmin ? (
              <NavLink
                to={paths.admin.href()}
                className={({ isActive }) => (isActive ? `${styles.navLink} ${styles.active}` : styles.navLink)}
              >
                Accounts
              </NavLink>
            ) : null}
          </nav>
          <div className={styles.account}>
            <SendQueueBadge userId={userId} />
            <AccountMenu displayName={displayName} email={email} onSignOut={onSignOut} />
          </div>
        </div>
      </header>
      <main id="main" className={styles.main} tabIndex={-1}>
        {children}
      </main>
      <footer className={styles.footer}>
        <OnTheWaterNotice />
      </footer>
    </div>
  );
}
