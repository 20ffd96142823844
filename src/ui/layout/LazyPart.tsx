import { Component, lazy, Suspense, type ComponentType, type ReactNode } from 'react';

interface BoundaryProps {
  /** What loads, in words ("the event set"). */
  readonly what: string;
  /** Starts a fresh load (a failed dynamic import stays failed). */
  readonly onRetry: () => void;
  /** Called at each render, so a retry renders the fresh load. */
  readonly children: () => ReactNode;
}

/**
 * Catches a part whose code could not be fetched (offline before the app was
 * stored, or a version replaced under an open page) and offers to try again;
 * the rest of the page and the scenario are untouched.
 */
class LoadBoundary extends Component<BoundaryProps, { error: string | null }> {
  override state: { error: string | null } = { error: null };

  static getDerivedStateFromError(error: unknown): { error: string } {
    return { error: error instanceof Error ? error.message : String(error) };
  }

  override render() {
    const { what, onRetry, children } = this.props;
    if (this.state.error === null) return children();
    return (
      <div className="lazy-part lazy-part--failed" role="alert">
        <p>
          <strong>The {what} could not be loaded</strong> ({this.state.error}). The scenario on screen is not affected.
          Check the connection and try again; if Raincut was updated in the meantime, reloading the page brings the new
          version.
        </p>
        <button
          type="button"
          onClick={() => {
            onRetry();
            this.setState({ error: null });
          }}
        >
          Try again
        </button>
      </div>
    );
  }
}

/**
 * A part of the screen whose code is fetched the first time it is shown
 * (React.lazy), with a plain loading line meanwhile and a way to try again
 * when the fetch fails. Keeps the first screen's JavaScript small.
 */
export function lazyPart<P extends object = Record<string, never>>(
  what: string,
  load: () => Promise<ComponentType<P>>,
): ComponentType<P> {
  const fresh = () => lazy(async () => ({ default: await load() }));
  let Loaded = fresh();
  function LazyPart(props: P) {
    return (
      <LoadBoundary
        what={what}
        onRetry={() => {
          Loaded = fresh();
        }}
      >
        {() => (
          <Suspense
            fallback={
              <p className="lazy-part" role="status">
                Loading the {what}…
              </p>
            }
          >
            <Loaded {...props} />
          </Suspense>
        )}
      </LoadBoundary>
    );
  }
  return LazyPart;
}
