import type { ReactNode } from 'react';
import { formatCount } from '../format';

/** The sketch's drawing box, in its own pixels (stretched to the width shown). */
export const SKETCH_WIDTH = 560;
export const SKETCH_HEIGHT = 110;
export const SKETCH_PAD = { top: 6, right: 4, bottom: 4, left: 4 } as const;
/** Lines listed under the sketch; the rest are counted. */
export const LISTED = 8;

export interface PreviewSketchProps {
  /** Accessible name of the sketch: what was read and its peak. */
  readonly label: string;
  /** Class of the one path that draws the series. */
  readonly pathClassName: string;
  readonly path: string;
  /** What the table lists, e.g. "Bars read". */
  readonly caption: string;
  /** How many were read; the table lists the first `LISTED`. */
  readonly count: number;
  /** The column headings, as `<th scope="col">` cells. */
  readonly headings: ReactNode;
  /** The listed rows. */
  readonly children: ReactNode;
}

/**
 * What an import would become: a sketch of the series (one path, however
 * many values) over a base line, and a table of the first few values.
 */
export function PreviewSketch({ label, pathClassName, path, caption, count, headings, children }: PreviewSketchProps) {
  const listed = Math.min(count, LISTED);
  return (
    <div className="paste-preview">
      <svg
        className="paste-preview__sketch"
        viewBox={`0 0 ${SKETCH_WIDTH} ${SKETCH_HEIGHT}`}
        preserveAspectRatio="none"
        role="img"
        aria-label={label}
      >
        <line
          className="paste-preview__base"
          x1={SKETCH_PAD.left}
          x2={SKETCH_WIDTH - SKETCH_PAD.right}
          y1={SKETCH_HEIGHT - SKETCH_PAD.bottom}
          y2={SKETCH_HEIGHT - SKETCH_PAD.bottom}
        />
        <path className={pathClassName} d={path} />
      </svg>
      <table className="paste-preview__table">
        <caption>
          {caption}
          {count > listed ? ` (first ${listed} of ${formatCount(count)})` : ''}
        </caption>
        <thead>
          <tr>{headings}</tr>
        </thead>
        <tbody>{children}</tbody>
      </table>
    </div>
  );
}
