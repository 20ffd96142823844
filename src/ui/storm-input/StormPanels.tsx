import { useStormInput } from './context';
import { lazyPart } from '../layout/LazyPart';
import './storm-input.css';

// The tools load when first opened (they are not part of the first screen).
const StormTools = lazyPart('storm tools', () => import('./tools/StormTools').then((m) => m.StormTools));

/** The storm tools, between the Rainfall region and the chart, while the "Storm tools" button is pressed. */
export function StormPanels() {
  const { toolsOpen } = useStormInput();
  return toolsOpen ? <StormTools /> : null;
}
