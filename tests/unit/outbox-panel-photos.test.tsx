// @vitest-environment happy-dom
import 'fake-indexeddb/auto';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { cleanup, fireEvent, render, screen, waitFor } from '@testing-library/react';
import { OutboxPanel } from '@/components/offline/OutboxPanel';
import { closeOutbox, enqueue, pending } from '@/lib/offline/outbox';

vi.mock('next/link', () => ({
  default: ({ href, children }: { href: string; children: React.ReactNode }) => <a href={href}>{children}</a>,
}));

const fetchMock = vi.fn();
/** happy-dom's FormData and object URLs refuse the Blob that comes back out of fake-indexeddb (Node's own). */
class LooseFormData {
  readonly parts: [string, unknown, string?][] = [];
  append(name: string, value: unknown, file?: string) {
    this.parts.push([name, value, file]);
  }
}
beforeEach(() => {
  indexedDB = new IDBFactory();
  closeOutbox();
  fetchMock.mockReset();
  vi.stubGlobal('fetch', fetchMock);
  vi.stubGlobal('FormData', LooseFormData);
  vi.spyOn(URL, 'createObjectURL').mockImplementation(() => 'blob:http://localhost/kept-photo');
  vi.spyOn(URL, 'revokeObjectURL').mockImplementation(() => {});
});
afterEach(() => {
  cleanup();
  closeOutbox();
  vi.unstubAllGlobals();
  vi.restoreAllMocks();
});

const withPhoto = (label: string) => ({
  kind: 'field-log' as const,
  url: '/api/field-log',
  body: { siteName: label, photoIds: [] },
  label,
  photos: [{ key: 'photo-key-0001', name: 'ram-house.jpg', blob: new Blob(['JPEG'], { type: 'image/jpeg' }) }],
});

describe('the outbox panel with photos and an ended session', () => {
  it('shows the photo kept with a record from the file on the phone', async () => {
    await enqueue(withPhoto('Hollin spring, 2 June'));
    fetchMock.mockRejectedValue(new TypeError('Failed to fetch'));
    render(<OutboxPanel />);
    const img = await screen.findByRole('img', { name: 'Photo 1: ram-house.jpg' });
    expect(img.getAttribute('src')).toMatch(/^blob:/);
  });

  it('a record sent after the session ended says so, stays, and goes when sent again after signing in', async () => {
    await enqueue(withPhoto('Hollin spring, 3 June'));
    fetchMock.mockResolvedValueOnce(
      Response.json({ error: { message: 'Sign in to add photos.', code: 'unauthenticated' } }, { status: 401 }),
    );
    render(<OutboxPanel />);
    expect((await screen.findByRole('alert')).textContent).toContain('you were signed out before it could go');
    expect(screen.getByRole('link', { name: 'sign in' }).getAttribute('href')).toMatch(/^\/sign-in\?callbackUrl=/);
    expect(await pending()).toHaveLength(1);
    fetchMock
      .mockResolvedValueOnce(Response.json({ photos: [{ id: 'AAAAAAAAAAAAAAAA' }] }, { status: 201 }))
      .mockResolvedValueOnce(Response.json({ id: 9, url: '/field-log/9' }, { status: 201 }));
    fireEvent.click(screen.getByRole('button', { name: /Send it again/ }));
    expect((await screen.findByRole('link', { name: 'Hollin spring, 3 June' })).getAttribute('href')).toBe(
      '/field-log/9',
    );
    await waitFor(async () => expect(await pending()).toEqual([]));
    const sent = JSON.parse(String(fetchMock.mock.calls.at(-1)![1].body));
    expect(sent.photoIds).toEqual(['AAAAAAAAAAAAAAAA']);
  });
});
