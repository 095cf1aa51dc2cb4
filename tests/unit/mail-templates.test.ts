import { describe, expect, it } from 'vitest';
import { plainText, renderMail, type MailContent } from '@/lib/mail/templates';
import { excerpt } from '@/lib/mail/notify';
import { palette } from '@/tailwind.config';

const content: MailContent = {
  subject: 'New answer: Drive pipe length for 4 ft of fall',
  preview: 'Ironwheel Builds answered your question.',
  heading: 'Your question has a new answer',
  paragraphs: ['Ironwheel Builds answered “Drive pipe length for 4 ft of fall”.'],
  quote: { by: 'Ironwheel Builds', text: 'Keep it straight.\nAnd <b>firm</b> & anchored.' },
  sections: [
    {
      title: 'New questions in your tags',
      items: [
        { title: 'Pump stops at dusk', url: 'http://x.example/questions/7', meta: 'Stops cycling · asked today' },
      ],
    },
  ],
  action: { label: 'Read the answer', url: 'http://x.example/questions/3#answer-9' },
  footer: {
    reason: 'You asked this question.',
    settingsUrl: 'http://x.example/settings#email',
    unsubscribe: { label: 'Stop these e-mails', url: 'http://x.example/unsubscribe?u=1&s=answers&t=abc' },
  },
};

describe('e-mail templates', () => {
  it('render an HTML part in the site’s colours with no images, and member text as text', async () => {
    const { html, subject } = await renderMail(content);
    expect(subject).toBe(content.subject);
    expect(html).toMatch(/^<!DOCTYPE html/i);
    expect(html).not.toMatch(/<img/i);
    expect(html).toContain(palette.creek[700]);
    expect(html).toContain('&lt;b&gt;firm&lt;/b&gt; &amp; anchored');
    expect(html).toContain('href="http://x.example/unsubscribe?u=1&amp;s=answers&amp;t=abc"');
    expect(html).toContain('Ironwheel Builds answered your question.');
  });

  it('write a plain-text part that reads as a letter: quote marked, links on their own lines', () => {
    const text = plainText(content);
    expect(text).toContain('> Keep it straight.\n> And <b>firm</b> & anchored.');
    expect(text).toContain(
      'NEW QUESTIONS IN YOUR TAGS\n\n* Pump stops at dusk\n  Stops cycling · asked today\n  http://x.example/questions/7',
    );
    expect(text).toContain('Read the answer: http://x.example/questions/3#answer-9');
    expect(text).toContain('Stop these e-mails: http://x.example/unsubscribe?u=1&s=answers&t=abc');
  });

  it('quote at most 200 characters, cut at a word', () => {
    const long = 'word '.repeat(300);
    const cut = excerpt(long);
    // 200 characters: a short excerpt, the rest read in the thread (common practice, no source)
    expect(cut.length).toBeLessThanOrEqual(201);
    expect(cut.endsWith('word…')).toBe(true);
    expect(excerpt('  short  ')).toBe('short');
  });
});
