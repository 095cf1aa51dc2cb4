import type { MailContent } from '@/lib/mail/templates';

/**
 * One message of each kind Clackwater sends as HTML (lib/mail/notify.ts, lib/mail/digest.ts),
 * with the words those builders put in, made long where a member's words can be: a long
 * title, a quote with a pasted link and no spaces, an unsubscribe link with its token.
 */
const site = 'http://127.0.0.1:3100';
const title =
  'Half-inch pump beats for a minute, then stops shut and will not restart until I tap the waste valve by hand — drive pipe too short?';
const pasted = `${site}/calculations/FerncombeY1?fall=4+ft&lift=29+ft&driveFlow=2+gal%2Fmin&driveLength=12+ft&efficiency=0.6`;
const footer = (reason: string): MailContent['footer'] => ({
  reason,
  settingsUrl: `${site}/settings#email`,
  unsubscribe: {
    label: 'Stop these e-mails',
    url: `${site}/unsubscribe?u=42&scope=answers&sig=0f3c9a1be27d44c6a8f1e0b2d3c4a5b6c7d8e9f00112233445566778899aabbcc`,
  },
});

export const MAIL_SAMPLES: { kind: string; content: MailContent }[] = [
  {
    kind: 'answer',
    content: {
      subject: `New answer: ${title}`,
      preview: 'Ironwheel Builds answered your question.',
      heading: 'Your question has a new answer',
      paragraphs: [`Ironwheel Builds answered “${title}”.`],
      quote: {
        by: 'Ironwheel Builds',
        text: `Twelve feet is on the short side for 4 ft of fall.\nThe worked numbers: ${pasted}\nReplace the 90° elbow with two 45° bends.`,
      },
      action: { label: 'Read the answer', url: `${site}/questions/1#answer-12` },
      footer: footer('You get this because you asked this question on Clackwater.'),
    },
  },
  {
    kind: 'reply',
    content: {
      subject: `New reply: ${title}`,
      preview: 'Ferncombe Tamsin replied to your answer.',
      heading: 'A reply to your answer',
      paragraphs: [`Ferncombe Tamsin replied to your answer in “${title}”.`],
      quote: {
        by: 'Ferncombe Tamsin',
        text: 'Thankyou—the‑intake‑screen‑was‑half‑out‑of‑the‑water‑all‑along!!!!!!!!!!!!',
      },
      action: { label: 'Read the reply', url: `${site}/questions/1#reply-7` },
      footer: footer('You get this because you wrote the post this replies to.'),
    },
  },
  {
    kind: 'fixed',
    content: {
      subject: `Your answer fixed it: ${title}`,
      preview: 'Ferncombe Tamsin marked your answer as the one that fixed it.',
      heading: 'Your answer fixed it',
      paragraphs: [
        `Ferncombe Tamsin marked your answer to “${title}” as the one that fixed it. It now shows first in the thread, for the next builder with the same trouble.`,
        'What fixed it, in Ferncombe Tamsin’s words: “A 30 ft drive pipe of rigid PVC instead of 12 ft”',
      ],
      action: { label: 'Open the thread', url: `${site}/questions/1#answer-12` },
      footer: footer('You get this because you answered this question on Clackwater.'),
    },
  },
  {
    kind: 'moderation',
    content: {
      subject: 'Your answer was hidden on Clackwater',
      preview: 'Your answer was hidden. Reason: unsafe advice',
      heading: 'Your answer was hidden',
      paragraphs: [
        `This concerns your answer in “${title}”.`,
        'The moderator’s reason: an air chamber made from a glass jar holds stored energy and can burst.',
        'Your notices in Settings keep a copy. You still see the post in the thread, marked with this reason; if you think this was a mistake, ask the moderators to review the decision from there.',
      ],
      action: { label: 'Open the thread', url: `${site}/questions/1#answer-12` },
      footer: footer('You get this because a moderator acted on something you posted.'),
    },
  },
  {
    kind: 'withdrawn',
    content: {
      subject: `Advice withdrawn as unsafe: ${title}`,
      preview: 'A moderator withdrew an answer in this thread as unsafe advice.',
      heading: 'An answer was withdrawn as unsafe',
      paragraphs: [
        `A moderator withdrew an answer in “${title}” as unsafe advice. If you read it in an earlier e-mail, please do not follow it.`,
        'The thread shows the answers that still stand.',
      ],
      action: { label: 'Open the thread', url: `${site}/questions/1` },
      footer: footer('You get this because you asked or follow this question on Clackwater.'),
    },
  },
  {
    kind: 'expert-decision',
    content: {
      subject: 'You are now an expert on Clackwater',
      preview: 'Your application for expert standing was approved.',
      heading: 'Your expert application was approved',
      paragraphs: [
        'You can now record safety checks on guides, and your answers carry the expert mark.',
        'The moderator wrote: thank you for the careful field log entries.',
      ],
      action: { label: 'Open your settings', url: `${site}/settings` },
      footer: footer('You get this because you applied for expert standing on Clackwater.'),
    },
  },
  {
    kind: 'digest',
    content: {
      subject: 'Your weekly Clackwater digest: 5 things to read',
      preview: 'New questions in your tags (2) · Still waiting for an answer (1) · Guides added or changed (2)',
      heading: 'Your weekly digest',
      paragraphs: ['Hello Ironwheel Builds, here is what happened on Clackwater in the last seven days.'],
      sections: [
        {
          title: 'New questions in your tags',
          items: [
            { title, url: `${site}/questions/1`, meta: 'stall · drive-pipe · tuning · 2 days ago · 1 answer' },
            {
              title: 'Delivery line: ½" or ¾" for 400 ft to the tank?',
              url: `${site}/questions/6`,
              meta: 'delivery-line · 3 days ago',
            },
          ],
        },
        {
          title: 'Still waiting for an answer',
          note: 'Questions in your tags that nobody has answered yet, oldest first.',
          items: [
            {
              title: 'Air chamber keeps water-logging after a week',
              url: `${site}/questions/10`,
              meta: 'air-chamber · 6 days ago',
            },
          ],
        },
        {
          title: 'Guides added or changed',
          items: [
            {
              title: 'Starting a ram pump for the first time',
              url: `${site}/guides/first-start`,
              meta: 'updated 2026-11-30 · first build',
            },
            {
              title: 'Sizing the drive pipe',
              url: `${site}/guides/drive-pipe`,
              meta: 'updated 2026-11-29 · working system',
            },
          ],
        },
      ],
      action: { label: 'Ask a question', url: `${site}/questions/ask` },
      footer: {
        ...footer(
          'You get this weekly because you chose a weekly digest in your settings. Follow or unfollow tags there to change what it holds.',
        ),
        unsubscribe: { label: 'Stop the digest', url: `${site}/unsubscribe?u=42&scope=digest&sig=abc` },
      },
    },
  },
];
