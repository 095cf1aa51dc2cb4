import { describe, expect, it } from 'vitest';
import { applicableActions, whyNotApplicable } from '@/lib/moderation/applicable';
import { MODERATION_ACTIONS } from '@/lib/vocabulary';

const at = '2026-12-01T10:00:00Z';

describe('which moderation actions fit a post', () => {
  it('offers no restore for an answer readers see, and no lock for an answer', () => {
    const shown = applicableActions(MODERATION_ACTIONS, { type: 'answer', hiddenAt: null, deletedAt: null });
    expect(shown).toEqual(['dismiss', 'hide', 'delete', 'warn', 'suspend']);
  });

  it('offers restore but not hide for a post a moderator hid; hide still confirms an automatic hide', () => {
    const hidden = { type: 'answer' as const, hiddenAt: at, hiddenReason: 'Unsafe as written.', deletedAt: null };
    expect(applicableActions(MODERATION_ACTIONS, hidden)).toContain('restore');
    expect(whyNotApplicable('hide', hidden)).toMatch(/already hidden/);
    const pending = { ...hidden, hiddenReason: 'flagged as unsafe advice by an expert; hidden pending review' };
    expect(whyNotApplicable('hide', pending)).toBeNull();
  });

  it('offers lock or unlock by the thread’s state, and nothing but restore, dismiss, warn and suspend once deleted', () => {
    const open = { type: 'question' as const, hiddenAt: null, deletedAt: null, lockedAt: null };
    expect(whyNotApplicable('lock', open)).toBeNull();
    expect(whyNotApplicable('unlock', open)).toMatch(/not locked/);
    expect(whyNotApplicable('lock', { ...open, lockedAt: at })).toMatch(/already locked/);
    const deleted = applicableActions(MODERATION_ACTIONS, { type: 'reply', hiddenAt: null, deletedAt: at });
    expect(deleted).toEqual(['dismiss', 'restore', 'warn', 'suspend']);
  });
});
