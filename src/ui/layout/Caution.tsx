import { CAUTION_TEXT } from '../../scenario';

/** The caution shown once, plainly (DESIGN.md, "Cautions shown to the user"); its text is the scenario layer's, shared with exports. */
export function Caution() {
  return (
    <p className="caution" role="note" aria-label="Caution">
      <strong>Caution.</strong> {CAUTION_TEXT}
    </p>
  );
}
