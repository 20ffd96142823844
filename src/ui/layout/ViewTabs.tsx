import { useRef, useState, type KeyboardEvent, type ReactNode } from 'react';
import './view-tabs.css';

export interface View {
  readonly id: string;
  readonly label: string;
  readonly content: ReactNode;
}

/**
 * The page's views as an accessible tab list (arrow keys, Home and End move
 * between tabs). A view is mounted when it is first opened (so a view whose
 * code loads lazily is fetched only then) and stays mounted while hidden,
 * so what was typed in one is still there on coming back. The first view is
 * shown at first.
 */
export function ViewTabs({ views }: { views: readonly View[] }) {
  const [current, setShown] = useState(views[0]?.id ?? '');
  const [opened, setOpened] = useState<ReadonlySet<string>>(() => new Set([current]));
  const setCurrent = (id: string): void => {
    setShown(id);
    setOpened((was) => (was.has(id) ? was : new Set(was).add(id)));
  };
  const tabs = useRef<(HTMLButtonElement | null)[]>([]);
  const move = (e: KeyboardEvent, k: number): void => {
    const n = views.length;
    const to =
      e.key === 'ArrowRight'
        ? (k + 1) % n
        : e.key === 'ArrowLeft'
          ? (k - 1 + n) % n
          : e.key === 'Home'
            ? 0
            : e.key === 'End'
              ? n - 1
              : -1;
    if (to < 0) return;
    e.preventDefault();
    const view = views[to];
    if (!view) return;
    setCurrent(view.id);
    tabs.current[to]?.focus();
  };
  return (
    <>
      {/* In a landmark of its own, so nothing on the page sits outside one. */}
      <nav aria-label="Views" className="view-tabs">
        <div role="tablist" aria-label="Views" className="view-tabs__list">
          {views.map((view, k) => (
            <button
              key={view.id}
              ref={(el) => {
                tabs.current[k] = el;
              }}
              type="button"
              role="tab"
              id={`tab-${view.id}`}
              aria-controls={`view-${view.id}`}
              aria-selected={current === view.id}
              tabIndex={current === view.id ? 0 : -1}
              className="view-tabs__tab"
              onClick={() => setCurrent(view.id)}
              onKeyDown={(e) => move(e, k)}
            >
              {view.label}
            </button>
          ))}
        </div>
      </nav>
      {/* The views share the page's one main landmark, so every view's content is inside it. */}
      <main className="view-tabs__views">
        {views.map((view) => (
          <div
            key={view.id}
            role="tabpanel"
            id={`view-${view.id}`}
            aria-labelledby={`tab-${view.id}`}
            hidden={current !== view.id}
            className="view-tabs__panel"
          >
            {opened.has(view.id) ? view.content : null}
          </div>
        ))}
      </main>
    </>
  );
}
