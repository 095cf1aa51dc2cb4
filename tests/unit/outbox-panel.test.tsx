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
beforeEach(() => {
  indexedDB = new IDBFactory();
  closeOutbox();
  fetchMock.mockReset();
  vi.stubGlobal('fetch', fetchMock);
});
afterEach(() => {
  cleanup();
  closeOutbox();
  vi.unstubAllGlobals();
});

const record = (label: string) => ({ kind: 'field-log' as const, url: '/api/field-log', body: { label }, label });

describe('the outbox panel', () => {
  it('says what waits while the send fails, and sends it on "send now"', async () => {
    await enqueue(record('Hollin spring, 2 June'));
    fetchMock.mockRejectedValueOnce(new TypeError('Failed to fetch'));
    render(<OutboxPanel />);
    expect(await screen.findByText(/Waiting to send \(tried once\)/)).toBeTruthy();
    fetchMock.mockResolvedValueOnce(Response.json({ id: 7, url: '/field-log/7' }, { status: 201 }));
    fireEvent.click(screen.getByRole('button', { name: 'Try again now' }));
    const link = await screen.findByRole('link', { name: 'Hollin spring, 2 June' });
    expect(link.getAttribute('href')).toBe('/field-log/7');
    await waitFor(async () => expect(await pending()).toEqual([]));
    expect(screen.getByText(/Nothing waiting/)).toBeTruthy();
  });

  it('shows a refusal with the server’s reason and keeps the record', async () => {
    await enqueue(record('Hollin spring, 3 June'));
    fetchMock.mockResolvedValueOnce(
      Response.json({ error: { message: 'Lift: must be above the fall.', field: 'lift' } }, { status: 422 }),
    );
    render(<OutboxPanel />);
    expect((await screen.findByRole('alert')).textContent).toContain('Lift: must be above the fall.');
    expect(await pending()).toHaveLength(1);
    fireEvent.click(screen.getByRole('button', { name: /Let it go/ }));
    await waitFor(async () => expect(await pending()).toEqual([]));
  });
});
