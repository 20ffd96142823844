import { computeLosses } from '../core';
import { DEMO_SCENARIO } from '../scenario/demo';

/** Minimal page: the demo scenario's totals from the core (the workbench replaces this). */
export function App() {
  const s = DEMO_SCENARIO;
  const r = computeLosses(s.storm, s.method);
  return (
    <main>
      <h1>Raincut</h1>
      <p>{s.name}</p>
      <dl>
        <dt>Rainfall</dt>
        <dd aria-label="Rainfall depth">{r.rainMm.toFixed(1)} mm</dd>
        <dt>Loss</dt>
        <dd aria-label="Loss depth">{r.totalLossMm.toFixed(1)} mm</dd>
        <dt>Rainfall excess</dt>
        <dd aria-label="Excess depth">{r.totalExcessMm.toFixed(1)} mm</dd>
      </dl>
      <p role="note">Screening estimates only. Follow local drainage criteria; designs need licensed professional review.</p>
    </main>
  );
}
