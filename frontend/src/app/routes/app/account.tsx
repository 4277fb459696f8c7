import { Heading, Text } from '@primer/react';
import { PageHeader } from '../../../components/layouts/page-header';
import { ChangePasswordForm } from '../../../features/account/components/change-password-form';
import { ProfileForm } from '../../../features/account/components/profile-form';
import { AppearanceForm } from '../../../features/account/components/appearance-form';
import { UnitsForm } from '../../../features/account/components/units-form';
import { useSignedInMe } from '../../../lib/auth';
import styles from './pages.module.css';

/** /account: name, units and password. */
export function Component() {
  const me = useSignedInMe();
  return (
    <>
      <PageHeader title="Your account" lead="These settings are yours alone; they do not change what your crew sees." />
      <div className={styles.sections}>
        <section aria-labelledby="profile-heading" className={styles.section}>
          <Heading as="h2" id="profile-heading" variant="medium">
            Name
          </Heading>
          <ProfileForm me={me} />
        </section>
        <section aria-labelledby="units-heading" className={styles.section}>
          <Heading as="h2" id="units-heading" variant="medium">
            Units
          </Heading>
          <Text as="p" className={styles.sectionLead}>
            How weights, lengths, depths and temperatures are shown to you. What was entered is stored as entered, so
            switching back and forth never rounds anything away.
          </Text>
          <UnitsForm units={me.user.units} />
        </section>
        <section aria-labelledby="appearance-heading" className={styles.section}>
          <Heading as="h2" id="appearance-heading" variant="medium">
            Appearance
          </Heading>
          <Text as="p" className={styles.sectionLead}>
            Kept on this device only: a phone on the water and a computer at home can differ.
          </Text>
          <AppearanceForm />
        </section>
        <section aria-labelledby="password-heading" className={styles.section}>
          <Heading as="h2" id="password-heading" variant="medium">
            Password
          </Heading>
          <ChangePasswordForm />
        </section>
      </div>
    </>
  );
}
