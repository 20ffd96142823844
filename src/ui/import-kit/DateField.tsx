import { useId, useState } from 'react';
// Straight from the module, not the io index: the one reader of a typed date (core's calendar, wall-clock.ts).
import { parseIsoDate } from '../../io/time-values';

/** A YYYY-MM-DD field that stores only a well-formed date (or none when emptied); bad text stays with its reason. */
export function DateField({
  value,
  hint,
  onChange,
}: {
  value: string | null;
  hint: string;
  onChange: (date: string | null) => void;
}) {
  const id = useId();
  const [draft, setDraft] = useState<{ text: string; message: string } | null>(null);
  const text = draft?.text ?? value ?? '';
  return (
    <div className={`field guess${draft ? ' field--bad' : ''}`}>
      <label htmlFor={id}>Date of the first time</label>
      <input
        id={id}
        type="text"
        placeholder="YYYY-MM-DD"
        autoComplete="off"
        value={text}
        aria-invalid={draft ? true : undefined}
        aria-describedby={`${id}-hint ${id}-msg`}
        onChange={(e) => {
          const typed = e.currentTarget.value;
          const t = typed.trim();
          if (t === '') {
            setDraft(null);
            onChange(null);
          } else if (!/^\d{4}-\d{2}-\d{2}$/.test(t)) {
            setDraft({ text: typed, message: `“${t}” is not a date; write it as YYYY-MM-DD, for example 2024-05-01.` });
          } else {
            const read = parseIsoDate(t);
            if (read.ok) {
              setDraft(null);
              onChange(t);
            } else {
              setDraft({ text: typed, message: `“${t}” is not a date; ${read.reason}` });
            }
          }
        }}
      />
      <p className="field__hint" id={`${id}-hint`}>
        {hint}
      </p>
      <p className="field__msg" id={`${id}-msg`} aria-live="polite">
        {draft?.message ?? null}
      </p>
    </div>
  );
}
