import { useState, type ReactNode } from 'react';
import { PinButton } from '../compare/PinButton';
import { ExportButtons } from '../export/ExportButtons';
import { BarMessageProvider, BarMessageView, type BarMessage } from '../services/bar-message';
import { CopyLink } from './CopyLink';
import { lazyPart } from '../layout/LazyPart';
import { ScenarioFile } from './ScenarioFile';
import './share.css';

/** The saved list's region, which the "Saved scenarios" button opens. */
const LIBRARY_PANEL_ID = 'saved-scenarios';

// The saved list loads when first opened (it is not part of the first screen).
const LibraryPanel = lazyPart<{ id: string }>('saved scenarios', () =>
  import('./LibraryPanel').then((m) => m.LibraryPanel),
);

function Group({ id, label, children }: { id: string; label: string; children: ReactNode }) {
  return (
    <div className="scenario-bar__group" role="group" aria-labelledby={`scenario-bar-${id}`}>
      <span className="scenario-bar__label" id={`scenario-bar-${id}`}>
        {label}
      </span>
      {children}
    </div>
  );
}

/**
 * The strip under the header with what is done to the scenario as a whole:
 * share it as a link, save or open it as a file, keep it in this browser's
 * list, export its table, chart and report, and pin it for comparison. The
 * last action's outcome shows in one message line under the strip.
 */
export function ScenarioBar() {
  const [message, setMessage] = useState<BarMessage | null>(null);
  const [libraryOpen, setLibraryOpen] = useState(false);
  return (
    <BarMessageProvider value={setMessage}>
      <section className="scenario-bar" aria-label="Scenario tools">
        <div className="scenario-bar__groups">
          <Group id="share" label="Share">
            <CopyLink />
          </Group>
          <Group id="file" label="File">
            <ScenarioFile />
            <button
              type="button"
              aria-expanded={libraryOpen}
              aria-controls={libraryOpen ? LIBRARY_PANEL_ID : undefined}
              onClick={() => setLibraryOpen(!libraryOpen)}
            >
              Saved scenarios
            </button>
          </Group>
          <Group id="export" label="Export">
            <ExportButtons />
          </Group>
          <Group id="compare" label="Compare">
            <PinButton />
          </Group>
        </div>
        <BarMessageView message={message} onDismiss={() => setMessage(null)} />
        {libraryOpen ? <LibraryPanel id={LIBRARY_PANEL_ID} /> : null}
      </section>
    </BarMessageProvider>
  );
}
