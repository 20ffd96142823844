import { useActions, useWorkbench } from '../../store';

/** Reports problems with the browser's saved copy (damaged, not saved, not available, changed in another tab) until dealt with. */
export function StorageNoticeBar() {
  const notice = useWorkbench((s) => s.notice);
  const actions = useActions();
  if (!notice) return null;
  if (notice.kind === 'other-tab') {
    return (
      <div className="notice" role="alert">
        <p>
          <strong>Changed in another tab.</strong> {notice.message}
        </p>
        <button type="button" onClick={notice.takeTheirs}>
          Open the other tab’s version
        </button>
        <button type="button" onClick={() => void notice.keepMine()}>
          Keep this one
        </button>
      </div>
    );
  }
  if (notice.kind === 'large-store') {
    return (
      <div className="notice" role="status">
        <p>
          <strong>Kept in this browser’s larger store.</strong> {notice.message}
        </p>
        <button type="button" onClick={() => actions.setNotice(null)}>
          Dismiss
        </button>
      </div>
    );
  }
  const title =
    notice.kind === 'set-aside'
      ? 'Saved scenario set aside'
      : notice.kind === 'save-failed'
        ? 'Not saved'
        : 'Saving is off';
  return (
    <div className="notice" role="alert">
      <p>
        <strong>{title}.</strong> {notice.message}
      </p>
      <button type="button" onClick={() => actions.setNotice(null)}>
        Dismiss
      </button>
    </div>
  );
}
