import { Component, type ReactNode } from 'react';

interface State {
  error: Error | null;
}

/** Catches a rendering error in one page and offers a way back, instead of a blank screen. */
export class ErrorBoundary extends Component<{ children: ReactNode }, State> {
  state: State = { error: null };

  static getDerivedStateFromError(error: Error): State {
    return { error };
  }

  render() {
    if (this.state.error) {
      return (
        <div role="alert" className="rounded border border-state-returned/40 bg-bad-bg p-6">
          <h2 className="text-lg font-semibold text-state-returned">✖ This page failed to show</h2>
          <p className="mt-1 text-sm">{this.state.error.message}</p>
          <button
            type="button"
            className="mt-3 rounded border border-line bg-panel px-3 py-1 text-sm"
            onClick={() => this.setState({ error: null })}
          >
            Try again
          </button>
        </div>
      );
    }
    return this.props.children;
  }
}
