import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { Alert } from './alert';
import { Page } from './page';

export interface UnavailablePageProps {
  /** The h1, e.g. "Boat not available". */
  title: string;
  /** A bold first line in the alert. */
  reason?: string;
  /** What went wrong (usually the API's message). */
  children: ReactNode;
  back: { to: string; label: string };
}

/** A screen whose row could not be shown (not found, not yours, failed to load): its heading, why, a way back. */
export function UnavailablePage({ title, reason, children, back }: UnavailablePageProps) {
  return (
    <Page title={title}>
      <Alert tone="error" title={reason}>
        {children}
      </Alert>
      <Link to={back.to}>{back.label}</Link>
    </Page>
  );
}
