import {
  TRANSFORMS,
  attempt,
  hasOrdinates,
  lagFromTimeOfConcentration,
  transformValue,
  validateTransform,
  withTransformValue,
  type OrdinatesTransform,
  type Transform,
  type TransformParam,
} from '../../core';
import { useActions, useDerived } from '../../store';
import { withTransform, withTransformParam } from '../../store/hydrograph-edits';
import { NumberField } from '../fields/NumberField';
import { formatValue } from '../format';
import { OrdinatesField } from './OrdinatesField';

/** The core's message for a candidate transform, or null when the core accepts it. */
function coreProblem(transform: Transform, key: string, value: number | undefined): string | null {
  const r = attempt(() => validateTransform(withTransformValue(transform, key, value)));
  return r.ok ? null : r.error.message;
}

function ParamField({ transform, param }: { transform: Transform; param: TransformParam }) {
  const actions = useActions();
  const value = transformValue(transform, param.key);
  const label = param.label;
  const set = (v: number | undefined, edit?: { coalesceKey: string; session: true }) =>
    actions.edit(`Set ${label.toLowerCase()}`, (s) => withTransformParam(s, param.key, v), edit);
  return (
    <NumberField
      id={`transform-${param.key}`}
      label={label}
      {...(param.unit === 'h' ? { unit: 'h' } : {})}
      value={value ?? null}
      plausible={param.unit === 'h' ? 'responseTime' : undefined}
      check={(v) => coreProblem(transform, param.key, v)}
      onCommit={(v, edit) => set(v, edit)}
      history={actions}
      hint={param.help}
      {...(param.optional
        ? {
            empty: { store: (edit: { coalesceKey: string; session: true }) => set(undefined, edit) },
            placeholder: '484',
          }
        : {})}
    />
  );
}

/** Lag from a time of concentration, lag = 0.6·Tc (NEH-630 ch. 15): a helper that sets the lag (`lagKey`). */
function TimeOfConcentration({ transform, lagKey }: { transform: Transform; lagKey: string }) {
  const actions = useActions();
  const lagH = transformValue(transform, lagKey);
  const tcH = lagH === undefined ? null : lagH / lagFromTimeOfConcentration(1);
  return (
    <NumberField
      id="transform-tc"
      label="Time of concentration Tc"
      unit="h"
      value={tcH}
      plausible="responseTime"
      check={(tc) => coreProblem(transform, lagKey, lagFromTimeOfConcentration(tc))}
      onCommit={(tc, edit) =>
        actions.edit(
          'Set lag from time of concentration',
          (s) => withTransformParam(s, lagKey, lagFromTimeOfConcentration(tc)),
          edit,
        )
      }
      history={actions}
      hint="Sets the lag to 0.6 × Tc (USDA NRCS, NEH-630 ch. 15, from memory)."
    />
  );
}

/** How far a pasted unit hydrograph's volume is from 1 mm over the catchment, in a sentence (null when within 0.1 %). */
export function volumeNote(depthMm: number | null): string | null {
  if (depthMm === null) return null;
  const off = (depthMm - 1) * 100;
  if (Math.abs(off) < 0.1) return null;
  return (
    `These ordinates hold ${formatValue(depthMm)} mm over the catchment, not 1 mm ` +
    `(${formatValue(Math.abs(off))} % ${off > 0 ? 'too much' : 'too little'}); ` +
    'the hydrograph scales them to 1 mm.'
  );
}

function UnitHydrographNote() {
  const depthMm = useDerived((d, s) => d.unitHydrographDepthMm(s));
  const note = volumeNote(depthMm);
  return note ? (
    <p className="hydrograph__volume" role="status" data-note="uh-volume">
      {note}
    </p>
  ) : null;
}

/** The parameters of the transform in use, generated from the core's TRANSFORMS table. */
export function TransformFields({ transform }: { transform: Transform }) {
  const actions = useActions();
  const spec = TRANSFORMS[transform.kind];
  const params = spec.params as readonly TransformParam[];
  const lagKey = params.find((p) => p.fromTimeOfConcentration)?.key;
  return (
    <div className="hydrograph__params" key={transform.kind}>
      {params.map((param) => (
        <ParamField key={param.key} transform={transform} param={param} />
      ))}
      {lagKey === undefined ? null : <TimeOfConcentration transform={transform} lagKey={lagKey} />}
      {hasOrdinates(transform) ? (
        <>
          <OrdinatesField
            transform={transform}
            onCommit={(values) => {
              const next: OrdinatesTransform = { ...transform, ordinatesM3sPerMm: values };
              const r = attempt(() =>
                actions.edit('Set unit hydrograph ordinates', (s) => withTransform(s, next), {
                  coalesceKey: 'uh-ordinates',
                }),
              );
              return r.ok ? null : r.error.message;
            }}
          />
          <UnitHydrographNote />
        </>
      ) : null}
    </div>
  );
}
