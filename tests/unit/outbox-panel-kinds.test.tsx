// @vitest-environment happy-dom
import 'fake-indexeddb/auto';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { cleanup, fireEvent, render, screen, waitFor, within } from '@testing-library/react';
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

describe('the outbox panel, every kind of record', () => {
  it('names each kind, says it waits, and offers to try again after a failed send', async () => {
    await enqueue({ kind: 'field-log', url: '/api/field-log', body: {}, label: 'Field log: Hollin spring' }, 1);
    await enqueue({ kind: 'site', url: '/api/sites', body: {}, label: 'Site: Lower meadow' }, 2);
    await enqueue({ kind: 'site-version', url: '/api/sites/Ab12Cd34/versions', body: {}, label: 'Survey changed' }, 3);
    await enqueue({ kind: 'question', url: '/api/questions', body: {}, label: 'Question: stops after dark' }, 4);
    fetchMock.mockRejectedValue(new TypeError('Failed to fetch'));
    render(<OutboxPanel />);
    await screen.findByText(/tried once/);
    const items = screen.getAllByRole('listitem');
    expect(items.map((li) => li.getAttribute('data-kind'))).toEqual(['field-log', 'site', 'site-version', 'question']);
    expect(items.map((li) => li.firstElementChild?.textContent)).toEqual([
      'Field log test',
      'New site',
      'Changed survey',
      'Question',
    ]);
    for (const li of items) expect(li.textContent).toContain('Waiting to send');
    // the network failed on the first: the rest were not tried
    expect(fetchMock).toHaveBeenCalledTimes(1);
    expect(screen.getByRole('button', { name: 'Try again now' })).toBeTruthy();
  });

  it('shows only the kinds asked for', async () => {
    await enqueue({ kind: 'field-log', url: '/api/field-log', body: {}, label: 'Field log: Hollin spring' });
    await enqueue({ kind: 'question', url: '/api/questions', body: {}, label: 'Question: stops after dark' });
    fetchMock.mockRejectedValue(new TypeError('Failed to fetch'));
    render(<OutboxPanel kinds={['question']} />);
    await screen.findByText(/Waiting to send/);
    expect(screen.getAllByRole('listitem').map((li) => li.getAttribute('data-kind'))).toEqual(['question']);
  });

  it('keeps a refused question with the server’s reason and a way back to its form', async () => {
    const q = await enqueue({
      kind: 'question',
      url: '/api/questions',
      body: { title: 'Stops after dark' },
      label: 'Question: Stops after dark',
      fixAt: '/questions/ask?outbox=abc',
    });
    fetchMock.mockResolvedValueOnce(
      Response.json({ error: { message: 'tags: no tag called night', field: 'tags' } }, { status: 422 }),
    );
    render(<OutboxPanel />);
    const item = (await screen.findByRole('alert')).closest('li')!;
    expect(item.textContent).toContain('tags: no tag called night');
    expect(
      within(item)
        .getByRole('link', { name: /Put it right/ })
        .getAttribute('href'),
    ).toBe('/questions/ask?outbox=abc');
    expect((await pending()).map((r) => [r.id, r.state])).toEqual([[q.id, 'refused']]);
    fireEvent.click(within(item).getByRole('button', { name: /Let it go/ }));
    await waitFor(async () => expect(await pending()).toEqual([]));
  });
});
