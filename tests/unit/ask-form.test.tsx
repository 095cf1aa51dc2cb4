// @vitest-environment happy-dom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { act, cleanup, fireEvent, render, screen, waitFor, within } from '@testing-library/react';

// The photo picker uploads files; these tests are about the text and the site sheet.
vi.mock('@/components/photos/PhotoPicker', () => ({ PhotoPicker: () => null }));

import { AskForm } from '@/components/questions/AskForm';

const TAGS = [
  { slug: 'drive-pipe', name: 'Drive pipe' },
  { slug: 'waste-valve', name: 'Waste valve' },
];

const fetchMock = vi.fn();
beforeEach(() => {
  // the form keeps its draft on the device; each test starts with none
  localStorage.clear();
  fetchMock.mockReset();
  fetchMock.mockResolvedValue(
    new Response(JSON.stringify({ items: [] }), { status: 200, headers: { 'content-type': 'application/json' } }),
  );
  vi.stubGlobal('fetch', fetchMock);
});
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
  vi.useRealTimers();
});

const type = (label: string | RegExp, value: string) =>
  fireEvent.change(screen.getByLabelText(label), { target: { value } });
const panel = () => screen.getByTestId('before-you-post');

describe('AskForm', () => {
  it('shows the schema’s message beside the title when it is too short', async () => {
    render(<AskForm tags={TAGS} />);
    // lib/validation/question.ts: title at least 10 characters (a UI threshold — common practice, no source)
    type('Title', 'Ram?');
    fireEvent.click(screen.getByRole('button', { name: /post my question/i }));
    const alert = await screen.findByText('title must be at least 10 characters');
    expect(alert.getAttribute('role')).toBe('alert');
    expect(screen.getByLabelText('Title').getAttribute('aria-invalid')).toBe('true');
    expect(fetchMock).not.toHaveBeenCalledWith('/api/questions', expect.anything());
  });

  it('puts the engine’s message in the stall check when the lift is not above the fall', () => {
    render(<AskForm tags={TAGS} />);
    // a ram cannot deliver below its own fall (lift must exceed fall) — common practice, no source
    type('Fall', '4 ft');
    type('Lift', '3 ft');
    expect(within(panel()).getByRole('alert').textContent).toMatch(/Lift: must be greater than the fall/);
  });

  it('lists likely causes, with guide links, for a sensible site sheet that stops after some beats', () => {
    render(<AskForm tags={TAGS} />);
    // the stall check card's own defaults (lib/calculators/defs/stallCheck.ts): invented demo site
    type('Fall', '4 ft');
    type('Lift', '29 ft');
    type('Drive pipe length', '24 ft');
    fireEvent.change(screen.getByLabelText('Drive pipe size'), { target: { value: '1' } });
    fireEvent.change(screen.getByLabelText('Drive pipe material'), { target: { value: 'steel-sch40' } });
    fireEvent.click(screen.getByLabelText('stops after some beats'));
    const causes = within(panel()).getByRole('list', { name: 'Likely causes' });
    const items = within(causes).getAllByRole('listitem');
    expect(items.length).toBeGreaterThan(0);
    for (const a of within(causes).getAllByRole('link'))
      expect(a.getAttribute('href')).toMatch(/^\/guides\/[a-z0-9-]+$/);
    expect(within(panel()).queryByRole('alert')).toBeNull();
  });

  it('asks for the drive pipe before ranking causes', () => {
    render(<AskForm tags={TAGS} />);
    type('Fall', '4 ft');
    type('Lift', '29 ft');
    expect(panel().textContent).toMatch(/Add the drive pipe length, drive pipe size, drive pipe material/);
  });

  it('shows similar questions from the search, and nothing when it fails', async () => {
    fetchMock.mockResolvedValue(
      new Response(JSON.stringify({ items: [{ id: 7, title: 'Ram stops after a dozen beats', fixed: true }] }), {
        status: 200,
      }),
    );
    render(<AskForm tags={TAGS} />);
    fireEvent.click(screen.getByLabelText('Drive pipe'));
    type('Fall', '4 ft');
    const link = await screen.findByRole('link', { name: 'Ram stops after a dozen beats' }, { timeout: 2000 });
    expect(link.getAttribute('href')).toBe('/questions/7');
    const url = String(fetchMock.mock.calls.at(-1)?.[0]);
    expect(url).toMatch(/^\/api\/questions\/similar\?/);
    const q = new URLSearchParams(url.split('?')[1]);
    expect(q.get('tags')).toBe('drive-pipe');
    expect(q.get('fall')).toBe('4 ft');

    fetchMock.mockRejectedValue(new TypeError('network down'));
    type('Lift', '29 ft');
    await waitFor(() => expect(screen.queryByRole('heading', { name: 'Similar questions' })).toBeNull(), {
      timeout: 2000,
    });
  });

  it('posts the question and puts the API’s field error beside that site sheet field', async () => {
    fetchMock.mockImplementation(async (url: string) =>
      url === '/api/questions'
        ? new Response(
            JSON.stringify({ error: { field: 'siteSheet.fall', message: 'Fall: could not read "lots" as a length' } }),
            { status: 400 },
          )
        : new Response(JSON.stringify({ items: [] }), { status: 200 }),
    );
    render(<AskForm tags={TAGS} defaultTag="waste-valve" guide="the-drive-pipe" />);
    type('Title', 'Ram stops after a few beats');
    type('What happened', 'It beats ten times and then the waste valve stays shut.');
    type('Fall', 'lots');
    await act(async () => {
      fireEvent.click(screen.getByRole('button', { name: /post my question/i }));
    });
    await screen.findByText('Fall: could not read "lots" as a length');
    const post = fetchMock.mock.calls.find((c) => c[0] === '/api/questions');
    const sent = JSON.parse(String(post?.[1]?.body));
    expect(sent).toMatchObject({
      title: 'Ram stops after a few beats',
      tags: ['waste-valve'],
      siteSheet: { fall: 'lots' },
      guide: 'the-drive-pipe',
      photoIds: [],
    });
    expect(Object.keys(sent.siteSheet)).toEqual(['fall']);
  });

  it('opens with the site’s sheet and posts the question about that site; a refusal of the site is said', async () => {
    fetchMock.mockImplementation(async (url: string) =>
      url === '/api/questions'
        ? new Response(JSON.stringify({ error: { field: 'siteId', message: 'No such site.' } }), { status: 404 })
        : new Response(JSON.stringify({ items: [] }), { status: 200 }),
    );
    // an invented site's plan: 5 ft of fall, 40 ft of lift, one pump, 33 ft of drive pipe (common practice, no source)
    const siteSheet = { fall: '5 ft', lift: '40 ft', pumps: '1', driveLength: '33 ft' };
    render(<AskForm tags={TAGS} defaultTag="drive-pipe" fromSite={{ id: 'RidgeSpring1', siteSheet }} />);
    expect((screen.getByLabelText('Fall') as HTMLInputElement).value).toBe('5 ft');
    type('Title', 'One pump or two for a dry summer?');
    type('What happened', 'The plan says one pump will do; is a second worth building?');
    await act(async () => {
      fireEvent.click(screen.getByRole('button', { name: /post my question/i }));
    });
    await screen.findByText('No such site.');
    const post = fetchMock.mock.calls.find((c) => c[0] === '/api/questions');
    const sent = JSON.parse(String(post?.[1]?.body));
    expect(sent).toMatchObject({ siteId: 'RidgeSpring1', siteSheet });
  });

  it('renders a live preview of the Markdown body', () => {
    render(<AskForm tags={TAGS} />);
    type('What happened', 'The drive pipe is **galvanised**.');
    const preview = screen.getByRole('region', { name: 'Preview' });
    expect(preview.innerHTML).toContain('<strong>galvanised</strong>');
  });
});
