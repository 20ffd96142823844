import { ProblemList } from '../services/bar-message';
import { useLinkState, useServices } from '../services/services';
import './share.css';

const quoted = (name: string): string => `“${name}”`;

/**
 * What a share link in the address did: a shared scenario waiting for the
 * user's choice (keep it, or go back to their own, which stays saved
 * meanwhile), a link that could not be opened, or the outcome of the choice.
 */
export function LinkNotice() {
  const { link } = useServices();
  const state = useLinkState();
  if (!link || state.kind === 'none') return null;

  if (state.kind === 'shared') {
    const own = !state.canSave
      ? 'This browser cannot save here, so nothing is saved either way.'
      : state.ownName === null
        ? 'Nothing is saved in this browser yet, and nothing will be until you choose.'
        : `Your own scenario ${quoted(state.ownName)} stays saved in this browser as it was.`;
    return (
      <section className="link-notice link-notice--shared" role="region" aria-labelledby="link-notice-title">
        <div className="link-notice__text">
          <h2 id="link-notice-title">Shared scenario: {quoted(state.name)}</h2>
          <p>
            This scenario came in a link and is shown exactly as it was sent. {own} Nothing is saved until you choose,
            including changes you make to the shared one.
          </p>
          {state.canSave && state.ownName !== null ? (
            <p>Keeping it puts your own scenario in Saved scenarios first, so you can open it again.</p>
          ) : null}
          {state.problem ? (
            <p className="link-notice__problem" role="alert">
              {state.problem}
            </p>
          ) : null}
        </div>
        <div className="link-notice__buttons">
          <button type="button" className="button--primary" onClick={link.keep}>
            Keep the shared scenario
          </button>
          <button type="button" onClick={link.back}>
            Back to my scenario
          </button>
        </div>
      </section>
    );
  }

  if (state.kind === 'refused') {
    return (
      <div className="link-notice link-notice--problem" role="alert">
        <div className="link-notice__text">
          <p>
            <strong>The shared link could not be opened.</strong> Nothing was changed: {quoted(state.ownName)} is on
            screen
            {state.ownSaved ? ' and your saved scenario is as it was.' : '.'}
          </p>
          <ProblemList problems={state.problems} label="What is wrong with the link" />
        </div>
        <button type="button" onClick={link.dismiss}>
          Dismiss link message
        </button>
      </div>
    );
  }

  return (
    <div className="link-notice link-notice--done" role="status">
      <p className="link-notice__text">{state.message}</p>
      <button type="button" onClick={link.dismiss}>
        Dismiss link message
      </button>
    </div>
  );
}
