import { Heading, Text } from '@primer/react';
import type { ReactNode } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import { BrandMark } from '../brand/brand-mark';
import { OnTheWaterNotice } from '../safety/on-the-water-notice';
import { paths } from '../../config/paths';
import styles from './auth-layout.module.css';

/** The frame of the signed-out screens: the mark, one card with a title and a form, and the cautions. */
export function AuthLayout({
  title,
  lead,
  children,
  footer,
}: {
  title: string;
  lead?: ReactNode;
  children: ReactNode;
  footer?: ReactNode;
}) {
  return (
    <div className={styles.page}>
      <main className={styles.main}>
        <RouterLink to={paths.home.href()} className={styles.brand}>
          <BrandMark size={40} />
          <span className={styles.brandName}>Shoalbook</span>
        </RouterLink>
        <Text as="p" className={styles.tagline}>
          The crew journal that shows which of your finds paid off.
        </Text>
        <div className={styles.card}>
          <Heading as="h1" className={styles.title}>
            {title}
          </Heading>
          {lead ? <div className={styles.lead}>{lead}</div> : null}
          {children}
        </div>
        {footer ? <div className={styles.after}>{footer}</div> : null}
      </main>
      <footer>
        <OnTheWaterNotice />
      </footer>
    </div>
  );
}
