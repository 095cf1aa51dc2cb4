// @vitest-environment happy-dom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { cleanup, fireEvent, render, screen, waitFor } from '@testing-library/react';
import { SWRConfig } from 'swr';
import { SuspendedMembers } from '@/components/moderation/SuspendedMembers';
import { ReviewItem, type ReviewItemView } from '@/components/moderation/ReviewItem';
import type { Role } from '@/lib/auth/policy';

const json = (body: unknown, status = 200) =>
  new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });
const fetchMock = vi.fn();
beforeEach(() => {
  fetchMock.mockReset();
  vi.stubGlobal('fetch', fetchMock);
});
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const suspended = {
  id: 42,
  handle: 'brook_rude',
  displayName: 'Brook Rude',
  role: 'member',
  until: '2099-01-31T23:59:59.000Z',
  reason: 'rude replies',
};

describe('SuspendedMembers', () => {
  it('lifts a suspension with the reason typed, then reloads the list', async () => {
    let listed = [suspended];
    fetchMock.mockImplementation(async (url: string, init?: RequestInit) => {
      if (init?.method === 'POST') {
        listed = [];
        return json({ auditId: 7, id: 42 });
      }
      return json({ items: listed });
    });
    render(
      <SWRConfig value={{ provider: () => new Map() }}>
        <SuspendedMembers />
      </SWRConfig>,
    );
    await screen.findByText(/rude replies/);
    fireEvent.click(screen.getByRole('button', { name: 'Lift suspension' }));
    expect(await screen.findByRole('alert')).toHaveProperty('textContent', expect.stringMatching(/needs a reason/));
    expect(fetchMock.mock.calls.some(([, init]) => init?.method === 'POST')).toBe(false);

    fireEvent.change(screen.getByLabelText('Reason for lifting it'), { target: { value: 'apologised in the thread' } });
    fireEvent.click(screen.getByRole('button', { name: 'Lift suspension' }));
    await screen.findByText(/can write again/);
    const post = fetchMock.mock.calls.find(([, init]) => init?.method === 'POST')!;
    expect(post[0]).toBe('/api/review/suspensions/42/lift');
    expect(JSON.parse(String(post[1].body))).toEqual({ reason: 'apologised in the thread' });
    await waitFor(() => expect(screen.getByText('No account is suspended.')).toBeTruthy());
  });
});

describe('ReviewItem and rank', () => {
  const item = (role: Role): ReviewItemView => ({
    post: {
      type: 'answer',
      id: 5,
      questionId: 1,
      questionTitle: 'Pump stops after a minute',
      body: 'Rude words here.',
      author: { id: 9, handle: 'someone', displayName: 'Someone', role },
      hiddenAt: null,
      deletedAt: null,
      createdAt: '2026-11-01T10:00:00.000Z',
    },
    flags: [
      {
        id: 1,
        reason: 'rude',
        note: null,
        flagger: { handle: 'flagger', displayName: 'Flagger', role: 'member' },
        createdAt: '2026-11-02T10:00:00.000Z',
      },
    ],
    revisions: [],
  });

  it('offers a moderator the actions on a member’s post, and the policy’s words instead on an admin’s', () => {
    const viewer = { id: 1, handle: 'moss_moderator', role: 'moderator' as const };
    const { unmount } = render(<ReviewItem item={item('member')} viewer={viewer} onDone={() => {}} />);
    expect(screen.queryByRole('button', { name: 'Apply' })).not.toBeNull();
    unmount();
    render(<ReviewItem item={item('admin')} viewer={viewer} onDone={() => {}} />);
    expect(screen.queryByRole('button', { name: 'Apply' })).toBeNull();
    expect(screen.getByText(/admin’s post or account/)).toBeTruthy();
  });
});
