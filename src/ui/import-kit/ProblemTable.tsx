import type { ImportProblem } from '../../io';
import { formatCount } from '../format';

/** Plain words for the settings keys a problem may name (row 0: a setting, not a line of the text). */
const SETTING_NAMES: Readonly<Record<string, string>> = {
  separator: 'Separator',
  decimal: 'Decimal mark',
  grouping: 'Thousands separator',
  valuesAlong: 'Values run',
  skipBlankLines: 'Skip blank lines inside the data',
  skipLines: 'Lines to skip at the top',
  hasHeader: 'First line holds column names',
  dateColumn: 'Date column',
  timeColumn: 'Time column',
  valueColumn: 'Rainfall column',
  timeKind: 'Times are',
  dateOrder: 'Dates are written',
  dateForTimesOfDay: 'Date of the first time',
  stepMinutesIfNoTime: 'Time step',
  valueKind: 'Values are',
  unit: 'Unit',
  timeMarks: 'Each time marks',
  gaps: 'Steps longer than the record’s',
  cumulativeFrom: 'Count cumulative depths from',
  text: 'the text',
};

function what(p: ImportProblem): string {
  return SETTING_NAMES[p.field] ?? p.field;
}

/** Reasons from the import layer start lower-case (they follow a place); show them as sentences. */
function sentence(reason: string): string {
  return reason.charAt(0).toUpperCase() + reason.slice(1);
}

/** Every problem in the way of the import, by line and column, with the text found and the reason. */
export function ProblemTable({ problems }: { problems: readonly ImportProblem[] }) {
  return (
    <div className="problems">
      <table className="problems__table">
        <caption>
          {problems.length === 1 ? '1 problem to fix' : `${formatCount(problems.length)} problems to fix`}
        </caption>
        <thead>
          <tr>
            <th scope="col">Line</th>
            <th scope="col">Column</th>
            <th scope="col">What</th>
            <th scope="col">Found</th>
            <th scope="col">Reason</th>
          </tr>
        </thead>
        <tbody>
          {problems.map((p, i) => (
            <tr key={i}>
              <td>{p.row > 0 ? p.row : '—'}</td>
              <td>{p.column > 0 ? p.column : '—'}</td>
              <td>{what(p)}</td>
              <td className="problems__found">{p.value === '' ? '(empty)' : p.value}</td>
              <td>{sentence(p.reason)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
