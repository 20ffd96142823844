import { useRef, type ReactNode, type RefObject } from 'react';
import { useStormInput } from '../context';
import { lazyPart } from '../../layout/LazyPart';

// The drawing settings and the layer that takes the pointer load when drawing
// first starts (they are not part of the first screen).
const DrawPanel = lazyPart('drawing settings', () => import('./DrawPanel').then((m) => m.DrawPanel));
const DrawLayer = lazyPart<{ wrapRef: RefObject<HTMLDivElement | null> }>('drawing layer', () =>
  import('./DrawLayer').then((m) => m.DrawLayer),
);

/**
 * Wraps the hyetograph. In drawing mode a layer over the chart takes the
 * pointer: press and sweep to set bar heights. The stroke is read against the
 * chart as it was at the press (so the axis cannot move under the pointer),
 * shown as it goes over the bars it replaces, and applied on release as one
 * undoable edit. Esc or a cancelled pointer drops it.
 */
export function DrawableChart({ children }: { children?: ReactNode }) {
  const { drawing } = useStormInput();
  const wrapRef = useRef<HTMLDivElement | null>(null);
  return (
    <>
      <div className={`drawable${drawing ? ' drawable--on' : ''}`} ref={wrapRef}>
        {children}
        {drawing ? <DrawLayer wrapRef={wrapRef} /> : null}
      </div>
      {/* Under the chart, so the chart stays in view while drawing. */}
      {drawing ? <DrawPanel /> : null}
    </>
  );
}
