import type { ReactNode } from 'react';
import { useParams } from 'react-router-dom';
import { UnavailablePage, type UnavailablePageProps } from '@/components/ui/unavailable-page';

export interface IdParamsProps<K extends string> {
  /** The path's id parameters, e.g. `['watchId', 'boatId']` for `/storm/:watchId/boats/:boatId`. */
  names: readonly K[];
  /** The screen shown when one of them is not a whole number above 0. */
  unavailable: Omit<UnavailablePageProps, 'children'>;
  children: (ids: Record<K, number>) => ReactNode;
}

/** Reads a screen's ids from its address and renders it with them, or says the link is wrong. */
export function IdParams<K extends string>({ names, unavailable, children }: IdParamsProps<K>) {
  const params = useParams();
  const ids = Object.fromEntries(names.map((n) => [n, Number(params[n])])) as Record<K, number>;
  if (!names.every((n) => Number.isInteger(ids[n]) && ids[n] > 0))
    return <UnavailablePage {...unavailable}>Check the link and try again.</UnavailablePage>;
  return children(ids);
}
