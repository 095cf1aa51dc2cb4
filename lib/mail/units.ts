import 'server-only';
import type { UnitSystem } from '@/lib/hydraulics';
import { quantitiesInUnits } from '@/lib/units/in-text';
import type { MailContent } from './templates';

/**
 * A message's words with every quantity in the recipient's saved units: titles, quotes of a
 * member's post and digest entries are written by members in either system ("1.5 m fall"),
 * and an e-mail is read far from the site's unit switch. Links and the footer stay as they are.
 */
export function mailInUnits<C extends Omit<MailContent, 'footer'>>(content: C, units: UnitSystem): C {
  const u = (text: string) => quantitiesInUnits(text, units);
  return {
    ...content,
    subject: u(content.subject),
    preview: u(content.preview),
    heading: u(content.heading),
    paragraphs: content.paragraphs.map(u),
    ...(content.quote ? { quote: { ...content.quote, text: u(content.quote.text) } } : {}),
    ...(content.sections
      ? {
          sections: content.sections.map((s) => ({
            ...s,
            items: s.items.map((i) => ({ ...i, title: u(i.title), ...(i.meta ? { meta: u(i.meta) } : {}) })),
          })),
        }
      : {}),
  };
}
