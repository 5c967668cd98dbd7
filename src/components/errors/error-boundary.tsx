import { Component, type ErrorInfo, type ReactNode } from 'react';

type Props = { fallback: (props: { error: unknown; reset: () => void }) => ReactNode; children: ReactNode };
type State = { error: unknown; hasError: boolean };

/** Last-resort boundary around the whole app (route errors are handled by the router's boundaries). */
export class ErrorBoundary extends Component<Props, State> {
  override state: State = { error: null, hasError: false };

  static getDerivedStateFromError(error: unknown): State {
    return { error, hasError: true };
  }

  override componentDidCatch(error: unknown, info: ErrorInfo) {
    console.error('Unhandled error in the app shell', error, info.componentStack);
  }

  reset = () => this.setState({ error: null, hasError: false });

  override render() {
    if (this.state.hasError) return this.props.fallback({ error: this.state.error, reset: this.reset });
    return this.props.children;
  }
}
