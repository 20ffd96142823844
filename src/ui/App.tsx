import { Fragment, type ReactNode } from 'react';
import { StoreProvider, useActions, type WorkbenchStore } from '../store';
import { Hyetograph } from './chart/Hyetograph';
import { useUndoShortcuts } from './keyboard/useUndoShortcuts';
import { Caution } from './layout/Caution';
import { Header } from './layout/Header';
import { StorageNoticeBar } from './layout/StorageNotice';
import { MatchingPanel } from './matching/MatchingPanel';
import { MethodPanel } from './method/MethodPanel';
import { HydrographChart, SeparationPanel } from './observed';
import { RainfallToolbar } from './rainfall/RainfallToolbar';
import { ResultsPanel } from './results/ResultsPanel';
import { BarTable, DrawableChart, RainfallTools, StormInputProvider, StormPanels } from './storm-input';
import { ComparePanel } from './compare';
import { PrintReport } from './export';
import { LinkNotice, ScenarioBar } from './share';
import { ScenarioServicesProvider, type ScenarioServices } from './services';
import { EventsView } from './events';
import { ViewTabs } from './layout/ViewTabs';
import { DesignStormView } from './design-storm';
import { useNumberFormat } from './number-format';

export interface AppProps {
  readonly store: WorkbenchStore;
  /** Rainfall-input tools (paste, draw, bar table, storm tools) shown in the Rainfall region. */
  readonly rainfallTools?: ReactNode;
  /** Storage, share-link session, clipboard and downloads for the scenario tools (default: the browser's). */
  readonly services?: ScenarioServices;
}

function Workbench({ rainfallTools }: { rainfallTools?: ReactNode }) {
  useUndoShortcuts(useActions());
  // Every number in the views is written in the reader's number format: a new format draws the views afresh
  // (text typed under the old one is dropped rather than read under the new), while the header and tabs stay.
  const format = useNumberFormat().id;
  return (
    <div className="app">
      <Header />
      <ScenarioBar />
      <Caution />
      {/* The workbench first and by default; the event set and design storms in views of their own. */}
      <ViewTabs
        views={[
          {
            id: 'workbench',
            label: 'Workbench',
            content: (
              <div className="bench" key={format}>
                <StorageNoticeBar />
                <LinkNotice />
                <div className="bench__main">
                  <StormInputProvider>
                    <RainfallToolbar tools={rainfallTools ?? <RainfallTools />} />
                    <StormPanels />
                    <DrawableChart>
                      <Hyetograph />
                    </DrawableChart>
                    <HydrographChart />
                    <ResultsPanel />
                    <SeparationPanel />
                    <BarTable />
                  </StormInputProvider>
                </div>
                <div className="bench__side">
                  <MethodPanel />
                  <MatchingPanel />
                </div>
                <ComparePanel />
              </div>
            ),
          },
          {
            id: 'events',
            label: 'Event set',
            content: (
              <Fragment key={format}>
                <EventsView />
              </Fragment>
            ),
          },
          {
            id: 'design',
            label: 'Design storm',
            content: (
              <Fragment key={format}>
                <DesignStormView />
              </Fragment>
            ),
          },
        ]}
      />
      <PrintReport />
    </div>
  );
}

/** The workbench screen, on the given store. */
export function App({ store, rainfallTools, services }: AppProps) {
  return (
    <StoreProvider store={store}>
      <ScenarioServicesProvider services={services}>
        <Workbench rainfallTools={rainfallTools} />
      </ScenarioServicesProvider>
    </StoreProvider>
  );
}
