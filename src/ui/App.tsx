import type { ReactNode } from 'react';
import { StoreProvider, useActions, type WorkbenchStore } from '../store';
import { Hyetograph } from './chart/Hyetograph';
import { useUndoShortcuts } from './keyboard/useUndoShortcuts';
import { Caution } from './layout/Caution';
import { Header } from './layout/Header';
import { StorageNoticeBar } from './layout/StorageNotice';
import { MatchingPanel } from './matching/MatchingPanel';
import { MethodPanel } from './method/MethodPanel';
import { RainfallToolbar } from './rainfall/RainfallToolbar';
import { ResultsPanel } from './results/ResultsPanel';
import { BarTable, DrawableChart, RainfallTools, StormInputProvider, StormPanels } from './storm-input';

export interface AppProps {
  readonly store: WorkbenchStore;
  /** Rainfall-input tools (paste, draw, bar table, storm tools) shown in the Rainfall region. */
  readonly rainfallTools?: ReactNode;
}

function Workbench({ rainfallTools }: { rainfallTools?: ReactNode }) {
  useUndoShortcuts(useActions());
  return (
    <div className="app">
      <Header />
      <Caution />
      <main className="bench">
        <StorageNoticeBar />
        <div className="bench__main">
          <StormInputProvider>
            <RainfallToolbar tools={rainfallTools ?? <RainfallTools />} />
            <StormPanels />
            <DrawableChart>
              <Hyetograph />
            </DrawableChart>
            <ResultsPanel />
            <BarTable />
          </StormInputProvider>
        </div>
        <div className="bench__side">
          <MethodPanel />
          <MatchingPanel />
        </div>
      </main>
    </div>
  );
}

/** The workbench screen, on the given store. */
export function App({ store, rainfallTools }: AppProps) {
  return (
    <StoreProvider store={store}>
      <Workbench rainfallTools={rainfallTools} />
    </StoreProvider>
  );
}
