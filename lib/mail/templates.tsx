import 'server-only';
import { Body, Container, Head, Heading, Hr, Html, Link, Preview, Section, Text } from '@react-email/components';
import { render } from '@react-email/render';
import { palette } from '@/tailwind.config';

/**
 * Every message Clackwater sends is one of these: a heading, a few paragraphs, an
 * optional quote of a member's words, sections of linked items, one action, and a
 * footer that says why it came and how to stop it. The same content renders to the
 * HTML part (the site's colours, no images, so it reads the same with images off)
 * and to the plain-text part.
 */
export interface MailItem {
  title: string;
  url: string;
  /** a short line under the title: tags, age, answer count */
  meta?: string;
}

export interface MailSection {
  title: string;
  items: MailItem[];
  /** a sentence under the section title, before its items */
  note?: string;
}

export interface MailContent {
  subject: string;
  /** the line mail programs show beside the subject */
  preview: string;
  heading: string;
  paragraphs: string[];
  /** a member's words, quoted as written (React escapes them in the HTML part) */
  quote?: { by: string; text: string };
  sections?: MailSection[];
  action?: { label: string; url: string };
  footer: { reason: string; settingsUrl: string; unsubscribe?: { label: string; url: string } };
}

const serif = 'Literata, Georgia, "Times New Roman", serif';
const sans = 'system-ui, -apple-system, "Segoe UI", Roboto, Arial, sans-serif';

/** A long word (a pasted link, a pipe part number) breaks instead of widening the message past a phone's screen. */
const wrap = { overflowWrap: 'anywhere' as const, wordBreak: 'break-word' as const };

/**
 * Phones: the viewport meta makes a phone lay the message out at its own width
 * (without it, 980 px shrunk to fit); below 480 px the card loses its side borders and
 * most of its padding so the text keeps the width. Clients that drop <style> still get
 * the fluid table and the inline sizes, which fit on their own.
 */
const PHONE_CSS = `@media only screen and (max-width: 480px) {
  .cw-card { border-left: 0 !important; border-right: 0 !important; border-radius: 0 !important; padding: 20px 16px !important; }
}`;

const s = {
  body: {
    backgroundColor: palette.limestone[100],
    color: palette.creek[900],
    fontFamily: sans,
    margin: 0,
    padding: '24px 0',
  },
  container: {
    backgroundColor: palette.limestone[50],
    border: `1px solid ${palette.limestone[300]}`,
    borderRadius: '6px',
    maxWidth: '600px',
    width: '100%',
    boxSizing: 'border-box' as const,
    padding: '24px 28px',
  },
  brand: {
    color: palette.creek[500],
    fontFamily: serif,
    fontSize: '15px',
    fontWeight: 600,
    letterSpacing: '0.04em',
    margin: '0 0 12px',
  },
  heading: {
    color: palette.creek[800],
    fontFamily: serif,
    fontSize: '24px',
    lineHeight: '1.25',
    margin: '0 0 12px',
    ...wrap,
  },
  p: { fontSize: '16px', lineHeight: '1.55', margin: '0 0 12px', ...wrap },
  quote: {
    borderLeft: `3px solid ${palette.clay[400]}`,
    color: palette.creek[700],
    fontSize: '16px',
    lineHeight: '1.55',
    margin: '0 0 16px',
    padding: '2px 0 2px 12px',
    whiteSpace: 'pre-line' as const,
    ...wrap,
  },
  quoteBy: { color: palette.creek[400], fontSize: '14px', margin: '0 0 4px', ...wrap },
  sectionTitle: { color: palette.creek[800], fontFamily: serif, fontSize: '19px', margin: '20px 0 6px', ...wrap },
  note: { color: palette.creek[500], fontSize: '15px', lineHeight: '1.5', margin: '0 0 8px', ...wrap },
  item: { fontSize: '16px', lineHeight: '1.4', margin: '0 0 2px', ...wrap },
  meta: { color: palette.creek[400], fontSize: '14px', margin: '0 0 10px', ...wrap },
  link: { color: palette.clay[600], textDecoration: 'underline' },
  action: {
    backgroundColor: palette.creek[700],
    borderRadius: '4px',
    color: palette.limestone[50],
    display: 'inline-block',
    fontSize: '16px',
    fontWeight: 600,
    // about 44 px tall: a thumb's target
    padding: '14px 20px',
    ...wrap,
    textDecoration: 'none',
  },
  hr: { borderColor: palette.limestone[300], margin: '24px 0 12px' },
  footer: { color: palette.creek[400], fontSize: '13px', lineHeight: '1.5', margin: '0 0 4px', ...wrap },
};

export function ClackwaterEmail({ content: c }: { content: MailContent }) {
  return (
    <Html lang="en">
      <Head>
        <meta name="viewport" content="width=device-width, initial-scale=1" />
        <style>{PHONE_CSS}</style>
      </Head>
      <Preview>{c.preview}</Preview>
      <Body style={s.body}>
        <Container style={s.container} className="cw-card">
          <Text style={s.brand}>CLACKWATER</Text>
          <Heading as="h1" style={s.heading}>
            {c.heading}
          </Heading>
          {c.paragraphs.map((p, i) => (
            <Text key={i} style={s.p}>
              {p}
            </Text>
          ))}
          {c.quote ? (
            <Section>
              <Text style={s.quoteBy}>{c.quote.by} wrote:</Text>
              <Text style={s.quote}>{c.quote.text}</Text>
            </Section>
          ) : null}
          {(c.sections ?? []).map((sec) => (
            <Section key={sec.title}>
              <Heading as="h2" style={s.sectionTitle}>
                {sec.title}
              </Heading>
              {sec.note ? <Text style={s.note}>{sec.note}</Text> : null}
              {sec.items.map((it) => (
                <Section key={it.url}>
                  <Text style={s.item}>
                    <Link href={it.url} style={s.link}>
                      {it.title}
                    </Link>
                  </Text>
                  {it.meta ? <Text style={s.meta}>{it.meta}</Text> : null}
                </Section>
              ))}
            </Section>
          ))}
          {c.action ? (
            <Section style={{ margin: '16px 0 4px' }}>
              <Link href={c.action.url} style={s.action}>
                {c.action.label}
              </Link>
            </Section>
          ) : null}
          <Hr style={s.hr} />
          <Text style={s.footer}>{c.footer.reason}</Text>
          <Text style={s.footer}>
            <Link href={c.footer.settingsUrl} style={s.link}>
              Change what Clackwater e-mails you
            </Link>
            {c.footer.unsubscribe ? (
              <>
                {' · '}
                <Link href={c.footer.unsubscribe.url} style={s.link}>
                  {c.footer.unsubscribe.label}
                </Link>
              </>
            ) : null}
          </Text>
        </Container>
      </Body>
    </Html>
  );
}

/**
 * The plain-text part, written out rather than scraped from the HTML so it reads as
 * a letter: links on their own lines, the quote marked with "> ".
 */
export function plainText(c: MailContent): string {
  const out: string[] = [c.heading, '', ...c.paragraphs.flatMap((p) => [p, ''])];
  if (c.quote) out.push(`${c.quote.by} wrote:`, ...c.quote.text.split('\n').map((l) => `> ${l}`), '');
  for (const sec of c.sections ?? []) {
    out.push(sec.title.toUpperCase(), '');
    if (sec.note) out.push(sec.note, '');
    for (const it of sec.items) out.push(`* ${it.title}`, ...(it.meta ? [`  ${it.meta}`] : []), `  ${it.url}`, '');
  }
  if (c.action) out.push(`${c.action.label}: ${c.action.url}`, '');
  out.push('--', c.footer.reason, `Change what Clackwater e-mails you: ${c.footer.settingsUrl}`);
  if (c.footer.unsubscribe) out.push(`${c.footer.unsubscribe.label}: ${c.footer.unsubscribe.url}`);
  return `${out.join('\n')}\n`;
}

export async function renderMail(c: MailContent): Promise<{ subject: string; html: string; text: string }> {
  return { subject: c.subject, html: await render(<ClackwaterEmail content={c} />), text: plainText(c) };
}
