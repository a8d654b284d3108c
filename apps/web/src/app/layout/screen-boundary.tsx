import { Component, type ReactNode } from 'react';
import { useLocation } from 'react-router-dom';
import { RouteErrorScreen } from '../routes/route-error';

interface CatcherProps {
  children: ReactNode;
  /** When this changes after an error, the children get another go (the visitor moved on). */
  resetKey?: string;
}

/** Catches what its children throw and shows the error screen instead. */
export class ErrorCatcher extends Component<CatcherProps, { error: unknown; caught: boolean }> {
  override state = { error: undefined as unknown, caught: false };

  static getDerivedStateFromError(error: unknown) {
    return { error, caught: true };
  }

  override componentDidUpdate(previous: CatcherProps) {
    if (this.state.caught && previous.resetKey !== this.props.resetKey)
      this.setState({ error: undefined, caught: false });
  }

  override render() {
    return this.state.caught ? <RouteErrorScreen error={this.state.error} /> : this.props.children;
  }
}

/**
 * Catches what a screen throws (a render error, or its code failing to download) and shows the error screen
 * instead; moving to another address starts afresh. The boundary is not remounted on navigation, so the
 * screen being left stays on view (and keeps focus) while the next one's code loads.
 */
export function ScreenBoundary({ children }: { children: ReactNode }) {
  const { pathname } = useLocation();
  return <ErrorCatcher resetKey={pathname}>{children}</ErrorCatcher>;
}
