import type { RainImportSettings } from '../../io';
// Straight from the modules, not the import kit's index, so the dialogs' code stays out of the first screen.
import { OpenFileButton } from '../import-kit/OpenFileButton';
import { useImportLauncher } from '../import-kit/use-import-launcher';
import { DRAW_PANEL_ID, STORM_TOOLS_ID, useStormInput } from './context';
import { lazyPart } from '../layout/LazyPart';
import './storm-input.css';

// The dialog and the text import behind it load when first opened (they are not part of the first screen).
const PasteDialog = lazyPart('paste dialog', () => import('./paste/PasteDialog').then((m) => m.PasteDialog));

/**
 * The buttons in the Rainfall region: paste or open rainfall (into the
 * preview dialog), draw on the chart, and show the storm tools.
 */
export function RainfallTools() {
  const { drawing, setDrawing, toolsOpen, setToolsOpen } = useStormInput();
  const paste = useImportLauncher<RainImportSettings>({
    fileWhat: 'the rainfall',
    beforeOpen: () => setDrawing(false),
  });

  return (
    <div className="storm-input__buttons" role="group" aria-label="Rainfall input">
      <button type="button" onClick={paste.openPaste} aria-haspopup="dialog">
        Paste rainfall…
      </button>
      <OpenFileButton inputLabel="Rainfall file to open" opensDialog onFile={paste.openFile}>
        Open rainfall file…
      </OpenFileButton>
      <button
        type="button"
        aria-pressed={drawing}
        aria-controls={drawing ? DRAW_PANEL_ID : undefined}
        onClick={() => setDrawing(!drawing)}
      >
        Draw bars
      </button>
      <button
        type="button"
        aria-expanded={toolsOpen}
        aria-controls={STORM_TOOLS_ID}
        onClick={() => setToolsOpen(!toolsOpen)}
      >
        Storm tools
      </button>
      {paste.fileMessage ? (
        <p className="storm-input__file-msg" role="alert">
          {paste.fileMessage}
        </p>
      ) : null}
      {paste.dialog ? <PasteDialog initial={paste.dialog} onClose={paste.close} /> : null}
    </div>
  );
}
