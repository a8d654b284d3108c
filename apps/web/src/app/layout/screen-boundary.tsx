import { Component, type ReactNode } from 'react';
import { useLocation } from 'react-router-dom';
import { RouteErrorScreen } from '../routes/route-error';

interface CatcherProps {
  children: ReactNode;
}

/** Catches what its children throw and shows the error screen instead (the whole app's outer boundary). */
export class ErrorCatcher extends Component<CatcherProps, { error: unknown; caught: boolean }> {
  override state = { error: undefined as unknown, caught: false };

  static getDerivedStateFromError(error: unknown) {
    return { error, caught: true };
  }

  override render() {
    return this.state.caught ? <RouteErrorScreen error={this.state.error} /> : this.props.children;
  }
}

/**
 * Catches what a screen throws (a render error, or its code failing to download) and shows the error screen
 * instead; moving to another address starts afresh.
 */
export function ScreenBoundary({ children }: CatcherProps) {
  const { pathname } = useLocation();
  return <ErrorCatcher key={pathname}>{children}</ErrorCatcher>;
}
