import { Component, type ErrorInfo, type ReactNode } from 'react';

export interface ErrorBoundaryProps {
  readonly children?: ReactNode;
  /** Moves the saved scenario aside (so a scenario that breaks the screen cannot break it again) and reloads. */
  readonly onSetAside?: () => void;
}

interface State {
  readonly error: Error | null;
}

/**
 * The last guard against a blank screen: if drawing the workbench throws,
 * say so plainly, keep the saved scenario, and offer a way out.
 */
export class ErrorBoundary extends Component<ErrorBoundaryProps, State> {
  override state: State = { error: null };

  static getDerivedStateFromError(error: unknown): State {
    return { error: error instanceof Error ? error : new Error(String(error)) };
  }

  override componentDidCatch(error: unknown, info: ErrorInfo): void {
    console.error('Raincut could not draw the workbench:', error, info.componentStack);
  }

  override render() {
    const { error } = this.state;
    if (!error) return this.props.children;
    return (
      <main className="crash">
        <h1>Raincut stopped drawing the workbench</h1>
        <p role="alert">
          Something went wrong on this screen: {error.message}. The scenario saved in this browser has not been changed.
        </p>
        <div className="crash__actions">
          <button type="button" onClick={() => window.location.reload()}>
            Reload
          </button>
          {this.props.onSetAside ? (
            <button type="button" onClick={this.props.onSetAside}>
              Set the saved scenario aside and start from the demo
            </button>
          ) : null}
        </div>
      </main>
    );
  }
}
