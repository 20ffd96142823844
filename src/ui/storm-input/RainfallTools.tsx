import { useRef, useState } from 'react';
import { DRAW_PANEL_ID, STORM_TOOLS_ID, useStormInput } from './context';
import { EMPTY_DRAFT, PasteDialog, type PasteDraft } from './paste/PasteDialog';
import { readTextFile } from './paste/read-file';

/**
 * The buttons in the Rainfall region: paste or open rainfall (into the
 * preview dialog), draw on the chart, and show the storm tools.
 */
export function RainfallTools() {
  const { drawing, setDrawing, toolsOpen, setToolsOpen } = useStormInput();
  const [dialog, setDialog] = useState<PasteDraft | null>(null);
  const [kept, setKept] = useState<PasteDraft>(EMPTY_DRAFT);
  const [fileMessage, setFileMessage] = useState<string | null>(null);
  const fileRef = useRef<HTMLInputElement | null>(null);

  const openWith = (draft: PasteDraft): void => {
    setDrawing(false);
    setFileMessage(null);
    setDialog(draft);
  };

  const openFile = async (file: File | undefined): Promise<void> => {
    if (!file) return;
    const read = await readTextFile(file);
    if (!read.ok) {
      setFileMessage(read.message);
      return;
    }
    openWith({ text: read.text, fileName: read.name, corrections: {} });
  };

  return (
    <div className="storm-input__buttons" role="group" aria-label="Rainfall input">
      <button type="button" onClick={() => openWith(kept)} aria-haspopup="dialog">
        Paste rainfall…
      </button>
      <button type="button" onClick={() => fileRef.current?.click()} aria-haspopup="dialog">
        Open rainfall file…
      </button>
      <input
        ref={fileRef}
        type="file"
        accept=".csv,.txt,.tsv,.dat,text/csv,text/plain"
        className="visually-hidden"
        tabIndex={-1}
        aria-label="Rainfall file to open"
        onChange={(e) => {
          const input = e.currentTarget;
          void openFile(input.files?.[0]).finally(() => {
            input.value = '';
          });
        }}
      />
      <button type="button" aria-pressed={drawing} aria-controls={drawing ? DRAW_PANEL_ID : undefined} onClick={() => setDrawing(!drawing)}>
        Draw bars
      </button>
      <button type="button" aria-expanded={toolsOpen} aria-controls={STORM_TOOLS_ID} onClick={() => setToolsOpen(!toolsOpen)}>
        Storm tools
      </button>
      {fileMessage ? (
        <p className="storm-input__file-msg" role="alert">
          {fileMessage}
        </p>
      ) : null}
      {dialog ? (
        <PasteDialog
          initial={dialog}
          onClose={(keep) => {
            setKept(keep ?? EMPTY_DRAFT);
            setDialog(null);
          }}
        />
      ) : null}
    </div>
  );
}
