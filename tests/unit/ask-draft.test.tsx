// @vitest-environment happy-dom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { act, cleanup, fireEvent, render, screen, within } from '@testing-library/react';

vi.mock('@/components/photos/PhotoPicker', () => ({ PhotoPicker: () => null }));

import { AskForm } from '@/components/questions/AskForm';
import { ASK_DRAFT_KEY, loadDraft, saveDraft } from '@/components/questions/ask-draft';
import { bareNumberUnit, typedUnits, withReaderUnits } from '@/components/questions/site-sheet-units';

const TAGS = [{ slug: 'drive-pipe', name: 'Drive pipe' }];
const fetchMock = vi.fn();
beforeEach(() => {
  localStorage.clear();
  fetchMock.mockReset();
  fetchMock.mockResolvedValue(new Response(JSON.stringify({ items: [] }), { status: 200 }));
  vi.stubGlobal('fetch', fetchMock);
});
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});
const type = (label: string | RegExp, value: string) =>
  fireEvent.change(screen.getByLabelText(label), { target: { value } });
const value = (label: string) => (screen.getByLabelText(label) as HTMLInputElement).value;

describe('the ask draft store', () => {
  it('keeps a draft with content, forgets an empty one and drops one it cannot read', () => {
    const draft = { title: 'Ram stops', body: '', tags: ['drive-pipe'], siteSheet: { fall: '5 ft' } };
    saveDraft(localStorage, draft);
    expect(loadDraft(localStorage)).toEqual(draft);
    saveDraft(localStorage, { title: ' ', body: '', tags: [], siteSheet: { fall: '' } });
    expect(localStorage.getItem(ASK_DRAFT_KEY)).toBeNull();
    localStorage.setItem(ASK_DRAFT_KEY, '{not json');
    expect(loadDraft(localStorage)).toBeUndefined();
    expect(localStorage.getItem(ASK_DRAFT_KEY)).toBeNull();
  });
});

describe('AskForm keeps the draft on the device', () => {
  it('restores title, tag, site sheet and symptom after leaving the page, until discarded', async () => {
    const first = render(<AskForm tags={TAGS} />);
    type('Title', 'Ram stops after a few beats');
    fireEvent.click(screen.getByLabelText('Drive pipe'));
    type('Fall', '5 ft');
    type('Drive pipe length', '20 ft');
    fireEvent.click(screen.getByLabelText('stops after some beats'));
    first.unmount(); // "How to fix it" replaces the page

    await act(async () => {
      render(<AskForm tags={TAGS} />);
    });
    expect(screen.getByTestId('draft-restored').textContent).toMatch(/draft is back/);
    expect(value('Title')).toBe('Ram stops after a few beats');
    expect((screen.getByLabelText('Drive pipe') as HTMLInputElement).checked).toBe(true);
    expect(value('Fall')).toBe('5 ft');
    expect(value('Drive pipe length')).toBe('20 ft');
    expect((screen.getByLabelText('stops after some beats') as HTMLInputElement).checked).toBe(true);

    await act(async () => {
      fireEvent.click(within(screen.getByTestId('draft-restored')).getByRole('button', { name: 'Discard this draft' }));
    });
    expect(value('Title')).toBe('');
    expect(value('Fall')).toBe('');
    expect(localStorage.getItem(ASK_DRAFT_KEY)).toBeNull();
    expect(screen.queryByRole('button', { name: 'Discard this draft' })).toBeNull();
  });

  it('clears the draft after a successful post', async () => {
    const assign = vi.fn();
    vi.stubGlobal('location', { ...window.location, assign });
    fetchMock.mockImplementation(async (url: string) =>
      url === '/api/questions'
        ? new Response(JSON.stringify({ id: 7, url: '/questions/7' }), { status: 201 })
        : new Response(JSON.stringify({ items: [] }), { status: 200 }),
    );
    render(<AskForm tags={TAGS} />);
    type('Title', 'Ram stops after a few beats');
    type('What happened', 'It beats ten times and then the waste valve stays shut.');
    fireEvent.click(screen.getByLabelText('Drive pipe'));
    expect(localStorage.getItem(ASK_DRAFT_KEY)).not.toBeNull();
    await act(async () => {
      fireEvent.click(screen.getByRole('button', { name: /post my question/i }));
    });
    expect(fetchMock.mock.calls.some((c) => c[0] === '/api/questions')).toBe(true);
    expect(localStorage.getItem(ASK_DRAFT_KEY)).toBeNull();
  });
});

describe('bare numbers in the site sheet', () => {
  it('says which unit a bare number is read in and writes it in on request', () => {
    render(<AskForm tags={TAGS} />);
    type('Drive pipe length', '20');
    const prompt = screen.getByTestId('unit-prompt');
    // the reader's units, as UnitsProvider gives them (its default here: no provider)
    expect(prompt.textContent).toMatch(/read in (ft|m), your units/);
    fireEvent.click(within(prompt).getByRole('button', { name: /^Add/ }));
    expect(value('Drive pipe length')).toMatch(/^20 (ft|m)$/);
    expect(screen.queryByTestId('unit-prompt')).toBeNull();
  });

  it('leaves counts and values with their own unit alone', () => {
    expect(bareNumberUnit('pumps', '2', 'US')).toBeUndefined();
    expect(bareNumberUnit('elbows', '1', 'US')).toBeUndefined();
    expect(bareNumberUnit('fall', '5 ft', 'US')).toBeUndefined();
    expect(bareNumberUnit('fall', '5', 'US')).toBe('ft');
    expect(bareNumberUnit('sourceFlow', '4', 'metric')).toBe('L/min');
    expect(withReaderUnits({ fall: '5', pumps: '2', lift: '30 ft' }, 'US')).toEqual({
      fall: '5 ft',
      pumps: '2',
      lift: '30 ft',
    });
  });

  it('answers in the units the asker typed, or the reader’s when the sheet gives none', () => {
    expect(typedUnits({ fall: '5 ft', sourceFlow: '4 gal/min' }, 'metric')).toBe('US');
    expect(typedUnits({ fall: '1.5 m', sourceFlow: '15 L/min' }, 'US')).toBe('metric');
    expect(typedUnits({ fall: '5', pumps: '2' }, 'metric')).toBe('metric');
  });
});

describe('the stall check in the asker’s units', () => {
  it('writes the drive pipe’s length in feet for someone who typed feet', () => {
    render(<AskForm tags={TAGS} />);
    // 20 ft of drive pipe on a 5 ft fall: L/H = 4, below 5–10 (PRACTICE, common practice, no published source)
    type('Fall', '5 ft');
    type('Lift', '30 ft');
    type('Drive pipe length', '20 ft');
    fireEvent.change(screen.getByLabelText('Drive pipe size'), { target: { value: '1' } });
    fireEvent.change(screen.getByLabelText('Drive pipe material'), { target: { value: 'pvc-sch40' } });
    type('Source flow the source can spare', '10 gal/min');
    fireEvent.click(screen.getByLabelText('stops after some beats'));
    const causes = within(screen.getByTestId('before-you-post')).getByRole('list', { name: 'Likely causes' });
    const items = within(causes).getAllByRole('listitem');
    expect(items[0]?.getAttribute('data-cause')).toBe('drive-pipe-outside-range');
    expect(items[0]?.textContent).toMatch(/20 ft/);
    expect(causes.textContent).not.toMatch(/L\/min/);
    // the expected delivery in US gallons, never litres, for someone who typed gal/min
    expect(causes.textContent).toMatch(/US gal\/h/);
    expect(causes.textContent).not.toMatch(/\bL\/(min|h)/);
  });
});
