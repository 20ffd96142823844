import { createContext, useContext, useMemo, useState, type ReactNode } from 'react';

/**
 * What the rainfall-input pieces share on screen (not in the scenario): is
 * the chart in drawing mode, are the storm tools shown. The toolbar buttons
 * set it; the drawing layer and the panels read it.
 */
export interface StormInputUi {
  readonly drawing: boolean;
  setDrawing(on: boolean): void;
  readonly toolsOpen: boolean;
  setToolsOpen(open: boolean): void;
}

const StormInputContext = createContext<StormInputUi | null>(null);

export function StormInputProvider({ children }: { children?: ReactNode }) {
  const [drawing, setDrawing] = useState(false);
  const [toolsOpen, setToolsOpen] = useState(false);
  const value = useMemo(() => ({ drawing, setDrawing, toolsOpen, setToolsOpen }), [drawing, toolsOpen]);
  return <StormInputContext.Provider value={value}>{children}</StormInputContext.Provider>;
}

export function useStormInput(): StormInputUi {
  const ui = useContext(StormInputContext);
  if (!ui) throw new Error('The rainfall-input tools need a <StormInputProvider> above them.');
  return ui;
}

/** Ids that tie the toolbar buttons to what they control. */
export const STORM_TOOLS_ID = 'storm-tools';
export const DRAW_PANEL_ID = 'draw-panel';
