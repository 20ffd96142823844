import { describeBaseflowRange, type BaseflowParam } from '../../core';
import { NumberField, type FieldEdit, type FieldHistory } from '../fields/NumberField';

export interface BaseflowParamFieldProps {
  readonly id: string;
  readonly param: BaseflowParam;
  /** The stored value in the core's unit; undefined when the parameter is automatic. */
  readonly value: number | undefined;
  /** Stores a value, or undefined for automatic; an InputError thrown here is shown as the field's message. */
  readonly onSet: (value: number | undefined, edit?: FieldEdit) => void;
  /** Where the edits are recorded (see NumberField). */
  readonly history?: FieldHistory;
  readonly hint: string;
  /** Extra words about the present value (where a sample lies, say). */
  readonly note?: string | null;
}

/**
 * A start of rise is a 0-based sample index in the core; people count
 * samples from 1, as the paste's problems and the preview do.
 */
const shown = (param: BaseflowParam, v: number): number => (param.unit === 'sample' ? v + 1 : v);
const stored = (param: BaseflowParam, v: number): number => (param.unit === 'sample' ? v - 1 : v);

function paramUnitWords(param: BaseflowParam): string {
  return param.unit === 'h' ? 'h' : param.unit === 'sample' ? 'sample no.' : param.unit === 'samples' ? 'samples' : '';
}

/**
 * One parameter of a baseflow method, from the core's table: label, unit,
 * bounds and whether it may be left empty (automatic). As in the other
 * number fields (it is one), text that cannot be stored stays with its reason
 * beside it, and the store keeps its last good value.
 */
export function BaseflowParamField({ id, param, value, onSet, history, hint, note }: BaseflowParamFieldProps) {
  return (
    <NumberField
      id={id}
      label={param.label}
      unit={paramUnitWords(param)}
      value={value ?? null}
      toDisplay={(v) => shown(param, v)}
      fromDisplay={(v) => stored(param, v)}
      empty={
        param.optional
          ? { store: (edit) => onSet(undefined, edit) }
          : { message: `Enter ${param.label.toLowerCase()}: ${describeBaseflowRange(param)}.` }
      }
      // The core's bounds count samples from 0; the field counts them from 1, so it says so itself.
      checkShown={
        param.unit === 'sample'
          ? (n) =>
              Number.isInteger(n) && n >= 1
                ? null
                : `${param.label} must be a whole sample number, 1 or more (got ${n}).`
          : undefined
      }
      // Times far outside any event record are refused before the core measures them against this one.
      plausible={param.unit === 'h' ? 'offset' : undefined}
      onCommit={onSet}
      history={history}
      placeholder={param.optional ? 'automatic' : undefined}
      hint={
        <>
          {hint}
          {note ? ` ${note}` : ''}
        </>
      }
    />
  );
}
