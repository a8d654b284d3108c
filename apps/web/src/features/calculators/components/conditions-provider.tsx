import { useState, type ReactNode } from 'react';
import {
  ConditionsContext,
  DEFAULT_CONDITIONS,
  sharedLoadN,
  type CalcConditions,
} from '../utils/conditions';

/** Holds the page's boat and conditions; calculators outside a provider use the defaults. */
export function ConditionsProvider({
  children,
  initial = DEFAULT_CONDITIONS,
}: {
  children: ReactNode;
  initial?: CalcConditions;
}) {
  const [conditions, setConditions] = useState(initial);
  return (
    <ConditionsContext.Provider
      value={{ conditions, setConditions, loadN: sharedLoadN(conditions) }}
    >
      {children}
    </ConditionsContext.Provider>
  );
}
