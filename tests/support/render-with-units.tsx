import type { ReactNode } from 'react';
import { render } from '@testing-library/react';
import { SessionProvider } from 'next-auth/react';
import { UnitsProvider } from '@/components/units/UnitsProvider';

/**
 * Renders a component inside what every page gives it: a signed-out session and the site's
 * unit preference, read from the `cw_units` cookie. The test file mocks next/navigation first.
 */
export function renderWithUnits(node: ReactNode) {
  return render(
    <SessionProvider session={null}>
      <UnitsProvider>{node}</UnitsProvider>
    </SessionProvider>,
  );
}
