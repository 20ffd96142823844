// What the scenario tools get from the page, passed in so tests give their
// own: the browser's storage, clipboard, downloads and print, the share-link
// session and the pinned scenarios (their board is src/store/pins.ts); and the scenario bar's message line that
// the share, export and pin buttons write to. Below every panel that uses it.
export { ScenarioServicesProvider, browserServices, type ScenarioServices } from './services';
