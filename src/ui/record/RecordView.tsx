import { useMemo, useState } from 'react';
import { attempt, totalDepthMm, type RecordEvent } from '../../core';
import type { FlowImportSettings, FlowRecord, ImportedStorm, RainImportSettings } from '../../io';
import { useActions, useScenario } from '../../store';
import { withRecordEvents, type RecordPick } from '../../store/record-edits';
import { recordEvents } from '../../store/record-split';
import { NumberField } from '../fields/NumberField';
import { formatCount, formatValue } from '../format';
import { OpenFileButton } from '../import-kit/OpenFileButton';
import { useImportLauncher } from '../import-kit/use-import-launcher';
import { formatDuration } from '../rainfall/RainfallToolbar';
import { barClock, barTimeText } from '../storm-input/bar-times';
import { displayUnit, fromDisplay, toDisplay, unitText } from '../units';
import { barStartsH } from './bands';
import { EventPicks } from './EventPicks';
import { OverviewChart } from './OverviewChart';
import { FlowRecordDialog, RainRecordDialog } from './RecordDialogs';

/** Starting minimum dry spell, h: the value of Driscoll et al. (1989) for US gauges (from memory); see SplitOptions. */
export const FIRST_MIN_DRY_H = 6;
/** Starting length of streamflow kept after each event's rain, h (common practice, no source: a day of recession). */
export const FIRST_AFTER_H = 24;

interface Held<R> {
  readonly record: R;
  readonly fileName: string | null;
}

const nonNegative = (what: string) => (v: number) => (v < 0 ? `${what} cannot be negative.` : null);

/**
 * Cutting a long gauge record into events: paste or open a month or a year
 * of rainfall (and the streamflow over the same period), see it whole with
 * the events marked, set the dry spell that separates two events and the
 * smallest event kept, pick events and add them to the event set in one
 * undoable step. The records stay in this view (they are not part of the
 * scenario); the events added are.
 */
export function RecordView() {
  const actions = useActions();
  const units = useScenario((s) => s.units);
  const setSize = useScenario((s) => s.eventSet.events.length);
  const [rain, setRain] = useState<Held<ImportedStorm> | null>(null);
  const [flow, setFlow] = useState<Held<FlowRecord> | null>(null);
  const [minDryH, setMinDryH] = useState(FIRST_MIN_DRY_H);
  const [minDepthMm, setMinDepthMm] = useState(0);
  const [afterH, setAfterH] = useState(FIRST_AFTER_H);
  // Events left out, by their first bar: a new split keeps the choice for the events that stay the same.
  const [leftOut, setLeftOut] = useState<ReadonlySet<number>>(() => new Set());
  const [said, setSaid] = useState<{ ok: boolean; text: string } | null>(null);
  const rainPaste = useImportLauncher<RainImportSettings>({
    fileWhat: 'the rainfall record',
    beforeOpen: () => setSaid(null),
  });
  const flowPaste = useImportLauncher<FlowImportSettings>({
    fileWhat: 'the streamflow record',
    beforeOpen: () => setSaid(null),
  });

  const storm = rain?.record ?? null;
  const startsH = useMemo(() => (storm ? barStartsH(storm) : new Float64Array(1)), [storm]);
  const events = recordEvents(storm, minDryH, minDepthMm);
  const { picked, unpicked } = useMemo(() => {
    const on: RecordEvent[] = [];
    const off: RecordEvent[] = [];
    for (const e of events) (leftOut.has(e.firstBar) ? off : on).push(e);
    return { picked: on, unpicked: off };
  }, [events, leftOut]);
  const spanH = startsH[startsH.length - 1] as number;
  const clock = barClock(storm?.startIso, spanH);
  const depthUnit = unitText(displayUnit('depth', units));

  const pick = (event: RecordEvent, on: boolean): void => {
    setSaid(null);
    setLeftOut((was) => {
      const next = new Set(was);
      if (on) next.delete(event.firstBar);
      else next.add(event.firstBar);
      return next;
    });
  };

  const add = (): void => {
    if (!storm || picked.length === 0) return;
    const picks: RecordPick[] = picked.map((event) => ({
      event,
      name: `Event from ${barTimeText(clock, startsH[event.firstBar] as number)}`,
    }));
    const n = picks.length;
    const r = attempt(() =>
      actions.edit(`Add ${n} event${n === 1 ? '' : 's'} from the long record`, (s) =>
        withRecordEvents(s, storm, picks, flow ? { record: flow.record, afterH } : null),
      ),
    );
    if (!r.ok) {
      setSaid({ ok: false, text: `Nothing was added: ${r.error.message}` });
      return;
    }
    setSaid({
      ok: true,
      text: `Added ${formatCount(n)} event${n === 1 ? '' : 's'} to the event set${flow ? ', each with its part of the streamflow record' : ''}. Undo takes ${n === 1 ? 'it' : 'them'} away again.`,
    });
  };

  const rainSummary = storm
    ? `${formatCount(storm.depthsMm.length)} bars over ${formatDuration(spanH)}${
        storm.startIso === undefined ? '' : ` from ${barTimeText(clock, 0)}`
      }, ${formatValue(toDisplay('depth', totalDepthMm(storm), units))} ${depthUnit} in all${
        rain?.fileName ? ` (read from ${rain.fileName})` : ''
      }.`
    : 'No rainfall record yet.';
  const flowSummary = flow
    ? `${formatCount(flow.record.timesH.length)} samples over ${formatDuration(
        (flow.record.timesH[flow.record.timesH.length - 1] as number) - (flow.record.timesH[0] as number),
      )}${flow.fileName ? ` (read from ${flow.fileName})` : ''}.`
    : 'No streamflow record: events are added with their rainfall only.';

  return (
    <div className="record-view">
      <section className="panel" aria-labelledby="record-title">
        <h2 id="record-title">Cut a long record into events</h2>
        <p className="panel__intro">
          Bring a month or a year of gauge rainfall, and the streamflow over the same period if you have it. The record
          is cut into events at dry spells; the events you pick join the event set, each as a storm of its own. The
          records stay in this view only: they are not saved with the scenario.
        </p>
        <div className="record-view__inputs">
          <div className="record-view__input" role="group" aria-label="Rainfall record">
            <div className="storm-input__buttons">
              <button type="button" onClick={rainPaste.openPaste} aria-haspopup="dialog">
                Paste rainfall record…
              </button>
              <OpenFileButton inputLabel="Rainfall record file to open" opensDialog onFile={rainPaste.openFile}>
                Open rainfall record file…
              </OpenFileButton>
            </div>
            <p className="record-view__summary" role="status">
              <strong>Rainfall:</strong> {rainSummary}
            </p>
            {rainPaste.fileMessage ? (
              <p className="storm-input__file-msg" role="alert">
                {rainPaste.fileMessage}
              </p>
            ) : null}
          </div>
          <div className="record-view__input" role="group" aria-label="Streamflow record">
            <div className="storm-input__buttons">
              <button type="button" onClick={flowPaste.openPaste} aria-haspopup="dialog">
                Paste streamflow record…
              </button>
              <OpenFileButton inputLabel="Streamflow record file to open" opensDialog onFile={flowPaste.openFile}>
                Open streamflow record file…
              </OpenFileButton>
              {flow ? (
                <button type="button" className="button--danger" onClick={() => setFlow(null)}>
                  Leave out streamflow
                </button>
              ) : null}
            </div>
            <p className="record-view__summary">
              <strong>Streamflow:</strong> {flowSummary}
            </p>
            {flowPaste.fileMessage ? (
              <p className="storm-input__file-msg" role="alert">
                {flowPaste.fileMessage}
              </p>
            ) : null}
          </div>
        </div>
      </section>

      <div className="record-view__work">
        <section className="panel record-view__split" aria-labelledby="record-split-title">
          <h2 id="record-split-title">Where one event ends</h2>
          <div className="record-view__fields">
            <NumberField
              id="record-min-dry"
              label="Dry spell that separates events"
              unit="h"
              value={minDryH}
              plausible="stormDuration"
              onCommit={(h) => setMinDryH(h)}
              hint={
                <>
                  The minimum inter-event time: rain after a dry spell at least this long starts a new event; a shorter
                  spell stays inside the event. Restrepo-Posada &amp; Eagleson (1982) choose it for a gauge so the
                  storms it separates are independent, and found a few hours to a day; 6 h was used for the rainfall
                  statistics of US gauges by Driscoll et al. (1989, US EPA). Both from memory.
                </>
              }
            />
            <NumberField
              id="record-min-depth"
              label="Smallest event kept"
              unit={depthUnit}
              value={minDepthMm}
              toDisplay={(mm) => toDisplay('depth', mm, units)}
              fromDisplay={(v) => fromDisplay('depth', v, units)}
              plausible="depth"
              onCommit={(mm) => setMinDepthMm(mm)}
              hint="Events with less rain are left out. A few millimetres keeps drizzle that makes no runoff off the list (common practice, no source)."
            />
            {flow ? (
              <NumberField
                id="record-after"
                label="Streamflow kept after the rain"
                unit="h"
                value={afterH}
                check={nonNegative('The time after the rain')}
                plausible="offset"
                onCommit={(h) => setAfterH(h)}
                hint="Each event takes the streamflow record from its start to this long after its last wet bar: enough for the recession, for baseflow separation."
              />
            ) : null}
          </div>
        </section>

        {storm ? (
          <section className="panel record-view__events" aria-labelledby="record-events-title">
            <h2 id="record-events-title">
              {formatCount(events.length)} event{events.length === 1 ? '' : 's'} found, {formatCount(picked.length)}{' '}
              picked
            </h2>
            <OverviewChart storm={storm} startsH={startsH} picked={picked} unpicked={unpicked} units={units} />
            {events.length > 0 ? (
              <>
                <div className="record-view__actions">
                  <button type="button" onClick={() => setLeftOut(new Set())}>
                    Pick all
                  </button>
                  <button type="button" onClick={() => setLeftOut(new Set(events.map((e) => e.firstBar)))}>
                    Pick none
                  </button>
                  <button type="button" className="button--primary" onClick={add} disabled={picked.length === 0}>
                    Add {formatCount(picked.length)} picked event{picked.length === 1 ? '' : 's'} to the event set
                  </button>
                  <span className="record-view__set">The set holds {formatCount(setSize)} now.</span>
                </div>
                {said ? (
                  <p
                    className={said.ok ? 'record-view__said' : 'record-view__said record-view__said--bad'}
                    role={said.ok ? 'status' : 'alert'}
                  >
                    {said.text}
                  </p>
                ) : null}
                <EventPicks
                  storm={storm}
                  startsH={startsH}
                  clock={clock}
                  events={events}
                  isPicked={(e) => !leftOut.has(e.firstBar)}
                  onPick={pick}
                  units={units}
                />
              </>
            ) : (
              <p>No event in this record reaches the smallest depth kept.</p>
            )}
          </section>
        ) : (
          <section className="panel record-view__events record-view__events--none" aria-label="Events">
            <p>Paste or open a rainfall record to see it here with its events.</p>
          </section>
        )}
      </div>

      {rainPaste.dialog ? (
        <RainRecordDialog
          initial={rainPaste.dialog}
          units={units}
          onClose={rainPaste.close}
          keepText={
            rain
              ? 'Replaces the rainfall record in this view; the event set is not changed.'
              : 'Shows the record here; nothing is added to the event set until you say so.'
          }
          onUse={(record, fileName) => {
            setRain({ record, fileName });
            setLeftOut(new Set());
            setSaid(null);
            return null;
          }}
        />
      ) : null}
      {flowPaste.dialog ? (
        <FlowRecordDialog
          initial={flowPaste.dialog}
          units={units}
          onClose={flowPaste.close}
          keepText={
            flow
              ? 'Replaces the streamflow record in this view; events already added keep theirs.'
              : 'Each event added from now on takes its part of this record.'
          }
          onUse={(record, fileName) => {
            setFlow({ record, fileName });
            setSaid(null);
            return null;
          }}
        />
      ) : null}
    </div>
  );
}
