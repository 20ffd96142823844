import { Component, type ErrorInfo, type ReactNode } from 'react';
import type { CrashRecovery, CrashReport } from '../../store/crash';

export interface ErrorBoundaryProps {
  readonly children?: ReactNode;
  /**
   * What was saved and what can be done about it (src/store/crash.ts). Without
   * it the screen says only what happened and offers a reload. A function
   * loads it when drawing fails (its code is not part of the first screen).
   */
  readonly recovery?: CrashRecovery | (() => Promise<CrashRecovery>);
  /** Reloads the page (tests pass their own). */
  readonly reload?: () => void;
  /** Hands the saved scenario's text to the user as a file. */
  readonly download?: (text: string) => void;
}

interface State {
  readonly error: Error | null;
  readonly report: CrashReport | null;
  /** What setting aside did, when it was tried. */
  readonly setAside: { readonly ok: boolean; readonly text: string } | null;
  /** The recovery in use, once given or loaded. */
  readonly recovery: CrashRecovery | null;
}

const reloadPage = (): void => window.location.reload();

/**
 * The last guard against a blank screen: if drawing the workbench throws,
 * say so plainly, say truthfully what is saved (once the autosave has been
 * stopped, so the change that broke the screen is not written after the
 * fact), and offer a way out that loses nothing: reload, set the saved
 * scenario aside (kept under Saved scenarios), or download it first.
 */
export class ErrorBoundary extends Component<ErrorBoundaryProps, State> {
  override state: State = { error: null, report: null, setAside: null, recovery: null };

  static getDerivedStateFromError(error: unknown): Partial<State> {
    return { error: error instanceof Error ? error : new Error(String(error)) };
  }

  override componentDidCatch(error: unknown, info: ErrorInfo): void {
    console.error('Raincut could not draw the workbench:', error, info.componentStack);
    const given = this.props.recovery;
    if (!given || this.state.report !== null || this.state.recovery !== null) return;
    if (typeof given !== 'function') {
      this.caught(given);
      return;
    }
    void given().then(
      (recovery) => this.caught(recovery),
      (loadError: unknown) =>
        this.setState({
          setAside: {
            ok: false,
            text: `What is saved could not be checked: the code for it did not load (${String(loadError)}). Reloading is safe; the autosave has been stopped.`,
          },
        }),
    );
  }

  private caught(recovery: CrashRecovery): void {
    const report = recovery.report();
    this.setState({ report, recovery });
    // A saved scenario in the large store is read before the screen says whether it is the one that failed.
    if (report.state === 'large') void recovery.checkLarge()?.then((checked) => this.setState({ report: checked }));
  }

  private readonly setAside = (): void => {
    const recovery = this.state.recovery;
    if (!recovery) return;
    const result = recovery.setAside();
    if (result.ok) (this.props.reload ?? reloadPage)();
    else this.setState({ setAside: result });
  };

  private readonly download = (): void => {
    const { download } = this.props;
    const recovery = this.state.recovery;
    if (!recovery || !download) return;
    // The slot holds only a marker for a scenario in the large store: the scenario itself is fetched from there.
    const large = this.state.report?.large ? recovery.largeText() : null;
    if (large) {
      void large.then((read) => (read.ok ? download(read.text) : this.setState({ setAside: read })));
      return;
    }
    const text = recovery.savedText();
    if (text != null) download(text);
  };

  private readonly startWithout = (): void => {
    if (this.state.recovery?.skipSavedNextTime()) (this.props.reload ?? reloadPage)();
    else
      this.setState({
        setAside: {
          ok: false,
          text: 'This tab cannot remember to leave the saved scenario unopened. Download it, then clear this site’s data in the browser to start afresh.',
        },
      });
  };

  override render() {
    const { error, report, setAside } = this.state;
    if (!error) return this.props.children;
    const reload = this.props.reload ?? reloadPage;
    const saved = report?.state === 'saved';
    const blocked = setAside !== null && !setAside.ok;
    return (
      <main className="crash">
        <h1>Raincut stopped drawing the workbench</h1>
        <p role="alert">Something went wrong on this screen: {error.message}.</p>
        {report ? <p className="crash__saved">{report.text}</p> : null}
        {setAside ? <p role="status">{setAside.text}</p> : null}
        <div className="crash__actions">
          <button type="button" onClick={reload}>
            Reload
          </button>
          {saved && !blocked ? (
            <button type="button" onClick={this.setAside}>
              Set the saved scenario aside and start from the demo
            </button>
          ) : null}
          {saved && this.props.download ? (
            <button type="button" onClick={this.download}>
              Download the saved scenario
            </button>
          ) : null}
          {saved && blocked ? (
            <button type="button" onClick={this.startWithout}>
              Start from the demo without opening it
            </button>
          ) : null}
        </div>
      </main>
    );
  }
}
