import type { EventRecapView } from '@shoalbook/shared';
import { FIND_KIND_LABELS } from '@shoalbook/shared';
import { escapeHtml } from '../mail/templates/escape-html';
import { htmlLayout, type MailMessage } from '../mail/templates/mail-message';
import { percent } from './readings';

const lb = (x: number) => `${x.toFixed(2)} lb`;

/**
 * The recap e-mail: the key numbers and a link, in our own words. It never carries a position (no coordinates,
 * no find names, which anglers often name after landmarks): kinds of finds only.
 */
export function recapMail(input: {
  crewName: string;
  senderName: string;
  recap: EventRecapView;
  link: string;
}): MailMessage {
  const { recap } = input;
  const kinds = new Map<string, number>();
  for (const f of recap.producingFinds) kinds.set(f.kind, (kinds.get(f.kind) ?? 0) + 1);
  const kindText =
    [...kinds.entries()]
      .map(([k, n]) => `${n} ${(FIND_KIND_LABELS as Record<string, string>)[k] ?? k}`.toLowerCase())
      .join(', ') || 'none yet';
  const dayLines = recap.days.map(
    (d) =>
      `${d.date}: ${d.counted.length} fish counted, ${lb(d.netLb)} net${d.official?.officialLb != null ? ` (official ${lb(d.official.officialLb)})` : ''}${d.dayPlace ? `, place ${d.dayPlace}` : ''}`,
  );
  const lines = [
    `Total: ${lb(recap.totals.officialLb)}${recap.totals.finalPlace ? `, final place ${recap.totals.finalPlace}` : ''}.`,
    ...dayLines,
    recap.bigFish ? `Big fish: ${lb(recap.bigFish.weightLb)} on ${recap.bigFish.day}.` : 'No big fish logged yet.',
    `Practice finds that paid off: ${recap.shareOfPracticePaidOff.successes} of ${recap.findsPracticed} (${percent(recap.shareOfPracticePaidOff.rate)}).`,
    `Producing finds by kind: ${kindText}.`,
  ];
  const title = `${recap.event.name} on ${recap.event.lake.name}`;
  const text = [
    `${input.senderName} shares the recap of ${title} from the crew "${input.crewName}".`,
    '',
    ...lines,
    '',
    `The full recap: ${input.link}`,
  ].join('\n');
  const html = htmlLayout([
    `${escapeHtml(input.senderName)} shares the recap of <strong>${escapeHtml(title)}</strong> from the crew <strong>${escapeHtml(input.crewName)}</strong>.`,
    lines.map(escapeHtml).join('<br>'),
    `<a href="${escapeHtml(input.link)}">Open the full recap</a>`,
  ]);
  return { subject: `Recap: ${title}`, text, html };
}
