import { useStormInput } from './context';
import { StormTools } from './tools/StormTools';

/** The storm tools, between the Rainfall region and the chart, while the "Storm tools" button is pressed. */
export function StormPanels() {
  const { toolsOpen } = useStormInput();
  return toolsOpen ? <StormTools /> : null;
}
