import type { FlowImportSettings } from '../../io';
import { useActions, useScenario, useWorkbenchStore, withoutStreamflow } from '../../store';
// Straight from the modules, not the import kit's index, so the dialogs' code stays out of the first screen.
import { OpenFileButton } from '../import-kit/OpenFileButton';
import { useImportLauncher } from '../import-kit/use-import-launcher';
import { lazyPart } from '../layout/LazyPart';

// The dialog and the text import behind it load when first opened (they are not part of the first screen).
const FlowPasteDialog = lazyPart('paste dialog', () =>
  import('./paste/FlowPasteDialog').then((m) => m.FlowPasteDialog),
);

/**
 * The buttons in the hydrograph's head: paste or open a streamflow record
 * (into the preview dialog), and take the record away (one undoable edit).
 */
export function StreamflowButtons() {
  const store = useWorkbenchStore();
  const actions = useActions();
  const hasRecord = useScenario((s) => s.streamflow !== null);
  const paste = useImportLauncher<FlowImportSettings>({ fileWhat: 'the streamflow record' });

  const remove = (): void => {
    const s = store.getState().scenario;
    // When the record was the observed runoff, the matching keeps the depth it showed.
    const target = store.derived.observedFromSeparation(s) ? store.derived.target(s) : null;
    actions.edit('Remove streamflow record', (doc) => withoutStreamflow(doc, target?.ok ? target.mm : undefined));
  };

  return (
    <div className="storm-input__buttons hydro__buttons" role="group" aria-label="Streamflow input">
      <button type="button" onClick={paste.openPaste} aria-haspopup="dialog">
        Paste streamflow…
      </button>
      <OpenFileButton inputLabel="Streamflow file to open" opensDialog onFile={paste.openFile}>
        Open streamflow file…
      </OpenFileButton>
      {hasRecord ? (
        <button type="button" className="button--danger" onClick={remove}>
          Remove record
        </button>
      ) : null}
      {paste.fileMessage ? (
        <p className="storm-input__file-msg" role="alert">
          {paste.fileMessage}
        </p>
      ) : null}
      {paste.dialog ? <FlowPasteDialog initial={paste.dialog} onClose={paste.close} /> : null}
    </div>
  );
}
