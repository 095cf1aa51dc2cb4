'use client';

import type { ComponentProps } from 'react';
import { calculatorView } from '../views';
import { Card } from './Card';

export { Field } from './Card';

/**
 * A live calculator with its view looked up by id, for pages that may show any calculator
 * (a share link, a worked calculation, the answer form). A guide's cards load one
 * calculator each instead (components/calculators/live), so they bring only their own.
 */
export function CalculatorCard(props: Omit<ComponentProps<typeof Card>, 'view'>) {
  return <Card {...props} view={calculatorView(props.def.id)} />;
}
