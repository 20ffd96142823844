import { useRef, useState } from 'react';
import { useActions, useScenario, useWorkbenchStore, withoutStreamflow } from '../../store';
import { readTextFile } from '../storm-input/paste/read-file';
import { EMPTY_FLOW_DRAFT, FlowPasteDialog, type FlowDraft } from './paste/FlowPasteDialog';

/**
 * The buttons in the hydrograph's head: paste or open a streamflow record
 * (into the preview dialog), and take the record away (one undoable edit).
 */
export function StreamflowButtons() {
  const store = useWorkbenchStore();
  const actions = useActions();
  const hasRecord = useScenario((s) => s.streamflow !== null);
  const [dialog, setDialog] = useState<FlowDraft | null>(null);
  const [kept, setKept] = useState<FlowDraft>(EMPTY_FLOW_DRAFT);
  const [fileMessage, setFileMessage] = useState<string | null>(null);
  const fileRef = useRef<HTMLInputElement | null>(null);

  const openWith = (draft: FlowDraft): void => {
    setFileMessage(null);
    setDialog(draft);
  };

  const openFile = async (file: File | undefined): Promise<void> => {
    if (!file) return;
    const read = await readTextFile(file, 'the streamflow record');
    if (!read.ok) {
      setFileMessage(read.message);
      return;
    }
    openWith({ text: read.text, fileName: read.name, corrections: {} });
  };

  const remove = (): void => {
    const s = store.getState().scenario;
    // When the record was the observed runoff, the matching keeps the depth it showed.
    const target = store.derived.observedFromSeparation(s) ? store.derived.target(s) : null;
    actions.edit('Remove streamflow record', (doc) => withoutStreamflow(doc, target?.ok ? target.mm : undefined));
  };

  return (
    <div className="storm-input__buttons hydro__buttons" role="group" aria-label="Streamflow input">
      <button type="button" onClick={() => openWith(kept)} aria-haspopup="dialog">
        Paste streamflow…
      </button>
      <button type="button" onClick={() => fileRef.current?.click()} aria-haspopup="dialog">
        Open streamflow file…
      </button>
      <input
        ref={fileRef}
        type="file"
        accept=".csv,.txt,.tsv,.dat,text/csv,text/plain"
        className="visually-hidden"
        tabIndex={-1}
        aria-label="Streamflow file to open"
        onChange={(e) => {
          const input = e.currentTarget;
          void openFile(input.files?.[0]).finally(() => {
            input.value = '';
          });
        }}
      />
      {hasRecord ? (
        <button type="button" className="button--danger" onClick={remove}>
          Remove record
        </button>
      ) : null}
      {fileMessage ? (
        <p className="storm-input__file-msg" role="alert">
          {fileMessage}
        </p>
      ) : null}
      {dialog ? (
        <FlowPasteDialog
          initial={dialog}
          onClose={(keep) => {
            setKept(keep ?? EMPTY_FLOW_DRAFT);
            setDialog(null);
          }}
        />
      ) : null}
    </div>
  );
}
