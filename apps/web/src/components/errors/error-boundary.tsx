import { Component, type ErrorInfo, type ReactNode } from 'react';

interface Props {
  fallback: (props: { error: unknown; reset: () => void }) => ReactNode;
  children: ReactNode;
  onReset?: () => void;
}

interface State {
  error: unknown;
  failed: boolean;
}

/** Catches a render error in one part of the page so the rest keeps working. */
export class ErrorBoundary extends Component<Props, State> {
  override state: State = { error: null, failed: false };

  static getDerivedStateFromError(error: unknown): State {
    return { error, failed: true };
  }

  override componentDidCatch(error: unknown, info: ErrorInfo): void {
    console.error('Polecourt: a part of the page failed', error, info.componentStack);
  }

  reset = (): void => {
    this.props.onReset?.();
    this.setState({ error: null, failed: false });
  };

  override render(): ReactNode {
    if (this.state.failed) return this.props.fallback({ error: this.state.error, reset: this.reset });
    return this.props.children;
  }
}
