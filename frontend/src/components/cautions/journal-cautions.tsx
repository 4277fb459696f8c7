import { AlertIcon, InfoIcon } from '@primer/octicons-react';
import { Text } from '@primer/react';
import type { ReactNode } from 'react';
import styles from './journal-cautions.module.css';

function Caution({ icon, title, children }: { icon: 'info' | 'alert'; title: string; children: ReactNode }) {
  const Icon = icon === 'alert' ? AlertIcon : InfoIcon;
  return (
    <aside className={icon === 'alert' ? `${styles.caution} ${styles.alert}` : styles.caution} aria-label={title}>
      <Icon size={16} className={styles.icon} aria-hidden />
      <Text size="small">
        <Text weight="semibold">{title}.</Text> {children}
      </Text>
    </aside>
  );
}

/** Beside event rules: Shoalbook's defaults are only where most events start. */
export function RulesCaution() {
  return (
    <Caution icon="info" title="Rules differ">
      Five fish and 12 inches are only where most events start. Bag and length limits change from state to state, from
      one water body to the next and between events: the event&rsquo;s own rules and the state wildlife agency&rsquo;s
      current regulations decide, not this form.
    </Caution>
  );
}

/** Beside practice finds: much of the searching happens at speed. */
export function OnPlaneCaution() {
  return (
    <Caution icon="alert" title="Searching at speed">
      Reading the sonar while running on plane means a life jacket on and the engine cut-off link clipped on before the
      hull comes up. Mark the spot and look at the screen later, keep to local boating law, and head in when lightning
      is near.
    </Caution>
  );
}

/** Beside "arrived here" / "left": between stops the boat runs on plane again. */
export function MovingOnCaution() {
  return (
    <Caution icon="alert" title="Running to the next stop">
      Common practice: life jacket on and the engine cut-off link clipped to you before the hull comes up, rods stowed
      and the phone put away before you run. Local boating law, the rules of navigation and the event&rsquo;s rules come
      first; leave the water when lightning is near.
    </Caution>
  );
}

/** Beside catch entry: the fish comes first, the log second. */
export function FishCareCaution() {
  return (
    <Caution icon="info" title="Fish first">
      Get the fish into an aerated, cool livewell before you type; log it between casts. Released fish go back quickly,
      with wet hands.
    </Caution>
  );
}

/** Beside the live bag: culling means handling fish again, so the care rules matter most here. */
export function LiveBagCaution() {
  return (
    <Caution icon="info" title="Fish care while culling">
      Common practice: keep the bag in an aerated livewell with cool water, handle fish with wet hands, cull quickly and
      release the culled fish at once, close to where it was caught. The event&rsquo;s own rules and the state wildlife
      agency decide on limits, lengths and dead-fish rules.
    </Caution>
  );
}

/** Beside exports: a list of positions is what a crew guards most. */
export function PositionsFileCaution() {
  return (
    <Caution icon="alert" title="Positions inside">
      The file holds the position of every find and catch. Keep it to your crew: a leaked waypoint list cannot be taken
      back.
    </Caution>
  );
}

/** Beside the check-in clock: the run back is the fastest and most hurried of the day. */
export function RunBackCaution() {
  return (
    <Caution icon="alert" title="Running back to check-in">
      A leave-by time here is the latest start for a straight line at full cruising speed; the way by water is longer,
      and wind, waves, no-wake zones and a queue at the ramp all add to it, so start earlier. Common practice: life
      jacket on and the engine cut-off link clipped to you before the hull comes up. What late costs is for the
      event&rsquo;s own rules to say, and local boating law comes first: no check-in is worth a run through lightning or
      a storm.
    </Caution>
  );
}
