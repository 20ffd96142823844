import { useStormInput } from './context';
import { DrawPanel } from './draw/DrawPanel';
import { StormTools } from './tools/StormTools';

/** The panels the rainfall buttons open, between the Rainfall region and the chart. */
export function StormPanels() {
  const { drawing, toolsOpen } = useStormInput();
  if (!drawing && !toolsOpen) return null;
  return (
    <>
      {drawing ? <DrawPanel /> : null}
      {toolsOpen ? <StormTools /> : null}
    </>
  );
}
