import { Fragment, type ReactNode } from 'react';
import { StoreProvider, loadHydrographSide, useActions, useScenario, type WorkbenchStore } from '../store';
import { Hyetograph } from './chart/Hyetograph';
import { useUndoShortcuts } from './keyboard/useUndoShortcuts';
import { Caution } from './layout/Caution';
import { Header } from './layout/Header';
import { StorageNoticeBar } from './layout/StorageNotice';
import { MatchingPanel } from './matching/MatchingPanel';
import { MethodPanel } from './method/MethodPanel';
import { HydrographChart } from './observed';
import { RainfallToolbar } from './rainfall/RainfallToolbar';
import { ResultsPanel } from './results/ResultsPanel';
import { CatchmentPanel } from './catchment/CatchmentPanel';
import { DrawableChart, RainfallTools, StormInputProvider, StormPanels } from './storm-input';
import { PrintReport } from './export/PrintReport';
import { ScenarioBar } from './share';
import { ScenarioServicesProvider, type ScenarioServices } from './services';
import { useNumberFormat } from './number-format';
import { useLinkState, usePins } from './services/services';
import { ViewTabs } from './layout/ViewTabs';
import { lazyPart } from './layout/LazyPart';
import { UpdateNotice } from './layout/UpdateNotice';
import type { UpdateChannel } from '../offline/updates';

// Views the first screen does not show load when first opened, so the first screen's JavaScript stays small
// (scripts/check-first-screen.mjs holds it under its budget).
const EventsView = lazyPart('event set', () => import('./events').then((m) => m.EventsView));
const DesignStormView = lazyPart('design storm view', () =>
  Promise.all([import('./design-storm'), loadHydrographSide()]).then(([m]) => m.DesignStormView),
);
const RainOverRunoff = lazyPart('rain over runoff view', () =>
  Promise.all([import('./observed/RainOverRunoff'), loadHydrographSide()]).then(([m]) => m.RainOverRunoff),
);
const RecordView = lazyPart('long record view', () => import('./record').then((m) => m.RecordView));
const ComparePanel = lazyPart('comparison', () => import('./compare').then((m) => m.ComparePanel));
// Parts that show the computed hydrograph wait for its code too (loadHydrographSide), so they draw it at once.
const HydrographPanel = lazyPart('runoff hydrograph', () =>
  Promise.all([import('./hydrograph/HydrographPanel'), loadHydrographSide()]).then(([m]) => m.HydrographPanel),
);

// Below the chart and the results, out of the first view: it loads just after the first screen.
const BarTable = lazyPart('bar table', () => import('./storm-input/table/BarTable').then((m) => m.BarTable));
const SeparationPanel = lazyPart('baseflow separation', () =>
  import('./observed/SeparationPanel').then((m) => m.SeparationPanel),
);

/** Baseflow separation, fetched once there is a streamflow record. */
function RecordSeparation() {
  const hasRecord = useScenario((s) => s.streamflow !== null);
  return hasRecord ? <SeparationPanel /> : null;
}

// What came in a link, and the choices it leaves: loaded when a link has been opened.
const LinkNoticeBody = lazyPart('link notice', () => import('./share/LinkNotice').then((m) => m.LinkNotice));

/** The notice about a shared link, fetched once a link has been opened. */
function LinkNotice() {
  return useLinkState().kind === 'none' ? null : <LinkNoticeBody />;
}

/** The comparison of pinned scenarios, fetched once something is pinned. */
function PinnedComparison() {
  const { pins, problems } = usePins();
  return pins.length > 0 || problems.length > 0 ? <ComparePanel /> : null;
}

export interface AppProps {
  readonly store: WorkbenchStore;
  /** Rainfall-input tools (paste, draw, bar table, storm tools) shown in the Rainfall region. */
  readonly rainfallTools?: ReactNode;
  /** Storage, share-link session, clipboard and downloads for the scenario tools (default: the browser's). */
  readonly services?: ScenarioServices;
  /** New versions of the installed app (main.tsx; none in tests and in the single-file build). */
  readonly updates?: UpdateChannel;
}

function Workbench({ rainfallTools, updates }: { rainfallTools?: ReactNode; updates?: UpdateChannel | undefined }) {
  useUndoShortcuts(useActions());
  // Every number in the views is written in the reader's number format: a new format draws the views afresh
  // (text typed under the old one is dropped rather than read under the new), while the header and tabs stay.
  const format = useNumberFormat().id;
  return (
    <div className="app">
      <Header />
      <ScenarioBar />
      <Caution />
      {updates ? <UpdateNotice updates={updates} /> : null}
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
                    {/* Right under the chart, and held in view at the window's foot: the numbers the line moves. */}
                    <ResultsPanel />
                    <CatchmentPanel />
                    <HydrographChart />
                    <RecordSeparation />
                    <BarTable />
                  </StormInputProvider>
                </div>
                <div className="bench__side">
                  <MethodPanel />
                  <HydrographPanel />
                  <MatchingPanel />
                </div>
                <PinnedComparison />
              </div>
            ),
          },
          {
            id: 'rain-over-runoff',
            label: 'Rain over runoff',
            content: (
              <Fragment key={format}>
                <RainOverRunoff />
              </Fragment>
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
          {
            id: 'record',
            label: 'Long record',
            content: (
              <Fragment key={format}>
                <RecordView />
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
export function App({ store, rainfallTools, services, updates }: AppProps) {
  return (
    <StoreProvider store={store}>
      <ScenarioServicesProvider services={services}>
        <Workbench rainfallTools={rainfallTools} updates={updates} />
      </ScenarioServicesProvider>
    </StoreProvider>
  );
}
