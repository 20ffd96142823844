import { CAUTION_TEXT } from '../../scenario';

/** The caution shown once, plainly (DESIGN.md, "Cautions shown to the user"); its text is the scenario layer's, shared with exports. */
export function Caution() {
  return (
    <aside className="caution" aria-label="Caution">
      <p role="note">
        <strong>Caution.</strong> {CAUTION_TEXT}
      </p>
    </aside>
  );
}
