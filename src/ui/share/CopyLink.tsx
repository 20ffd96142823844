import { useWorkbenchStore } from '../../store';
import { useBarMessage } from '../services/bar-message';
import { useServices } from '../services/services';

/**
 * "Copy link": the whole scenario in a link, on the clipboard. What it does
 * (copy-link-run.tsx, with the link maker and its compressor) loads on the
 * first click, not with the first screen.
 */
export function CopyLink() {
  const store = useWorkbenchStore();
  const services = useServices();
  const show = useBarMessage();
  const copy = async (): Promise<void> => {
    let run: typeof import('./copy-link-run');
    try {
      run = await import('./copy-link-run');
    } catch (error) {
      const message = error instanceof Error && error.message !== '' ? error.message : 'the browser refused';
      show({ tone: 'problem', title: `No link was made: ${message}.` });
      return;
    }
    await run.copyLink(store.getState().scenario, services, show);
  };
  return (
    <button type="button" onClick={() => void copy()} title="Put the whole scenario in a link and copy it">
      Copy link
    </button>
  );
}
