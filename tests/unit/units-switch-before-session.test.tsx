// @vitest-environment happy-dom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { act, cleanup, fireEvent, render, screen } from '@testing-library/react';

vi.mock('next/navigation', () => ({ useRouter: () => ({ refresh: () => {}, push: () => {} }) }));

/** The session as next-auth's hook hands it out; each test moves it along as the fetch would. */
type Session = { status: 'loading' | 'authenticated' | 'unauthenticated'; data: unknown };
let session: Session = { status: 'loading', data: undefined };
const update = vi.fn(async () => null);
vi.mock('next-auth/react', () => ({ useSession: () => ({ ...session, update }) }));

import { UnitsProvider, useUnits } from '@/components/units/UnitsProvider';

function Switch() {
  const { units, setUnits } = useUnits();
  return (
    <>
      <output data-testid="units">{units}</output>
      <button type="button" onClick={() => setUnits('metric')}>
        Metric
      </button>
    </>
  );
}
const tree = () => (
  <UnitsProvider>
    <Switch />
  </UnitsProvider>
);
const signedInWith = (units: 'US' | 'metric'): Session => ({
  status: 'authenticated',
  data: { user: { id: '1', units }, expires: '2099-01-01T00:00:00.000Z' },
});

const fetchMock = vi.fn();
beforeEach(() => {
  document.cookie = 'cw_units=US; path=/';
  session = { status: 'loading', data: undefined };
  update.mockClear();
  fetchMock.mockReset();
  fetchMock.mockResolvedValue(new Response(JSON.stringify({ units: 'metric' }), { status: 200 }));
  vi.stubGlobal('fetch', fetchMock);
});
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});
const puts = () =>
  fetchMock.mock.calls
    .filter(([url, init]) => String(url).endsWith('/api/account/units') && init?.method === 'PUT')
    .map(([, init]) => JSON.parse(String(init.body)) as { units: string });

describe('the header’s switch pressed before the session has loaded', () => {
  it('keeps the reader’s choice and saves it, rather than taking the older saved units back', async () => {
    const view = render(tree());
    fireEvent.click(screen.getByRole('button', { name: 'Metric' }));
    expect(screen.getByTestId('units').textContent).toBe('metric');
    // the session arrives afterwards, still carrying the units saved before the switch
    session = signedInWith('US');
    await act(async () => view.rerender(tree()));
    expect(screen.getByTestId('units').textContent).toBe('metric');
    expect(document.cookie).toContain('cw_units=metric');
    expect(puts()).toEqual([{ units: 'metric' }]);
  });

  it('still takes up the saved units when the reader switched nothing', async () => {
    const view = render(tree());
    session = signedInWith('metric');
    await act(async () => view.rerender(tree()));
    expect(screen.getByTestId('units').textContent).toBe('metric');
    expect(puts()).toEqual([]);
  });

  it('a visitor’s switch stays in this browser only', async () => {
    const view = render(tree());
    fireEvent.click(screen.getByRole('button', { name: 'Metric' }));
    session = { status: 'unauthenticated', data: null };
    await act(async () => view.rerender(tree()));
    expect(screen.getByTestId('units').textContent).toBe('metric');
    expect(puts()).toEqual([]);
  });
});
