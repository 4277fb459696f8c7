import { Heading, Text } from '@primer/react';
import styles from './on-the-water-notice.module.css';

/**
 * Safety cautions shown at the foot of every screen. Shoalbook records fishing; it does not decide what is
 * safe or legal: the boating law, the event's rules and the state wildlife agency do.
 */
export function OnTheWaterNotice() {
  return (
    <aside className={styles.notice} aria-labelledby="on-the-water-heading">
      <Heading as="h2" id="on-the-water-heading" className={styles.heading}>
        On the water
      </Heading>
      <ul className={styles.list}>
        <li>
          <Text weight="semibold">Running on plane:</Text> life jacket on and the engine cut-off lanyard clipped to you
          before the hull comes up. Local boating law and the rules of navigation come first.
        </li>
        <li>
          <Text weight="semibold">Lightning:</Text> when thunder can be heard, head for shore. No spot and no weigh-in
          is worth staying out.
        </li>
        <li>
          <Text weight="semibold">Fish care:</Text> keep the livewell running, aerated and cool, handle fish with wet
          hands and release them promptly.
        </li>
        <li>
          <Text weight="semibold">Limits:</Text> length and bag limits are set by each event&rsquo;s rules and by the
          state wildlife agency&rsquo;s current regulations, not by Shoalbook. Check them before you go.
        </li>
      </ul>
    </aside>
  );
}
