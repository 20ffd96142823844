/** The caution the design asks to show once, plainly (DESIGN.md, "Cautions shown to the user"). */
export const CAUTION_TEXT =
  'Screening estimates for calibration support. Loss parameters vary between storms and catchments. ' +
  'Designs that affect safety or property must follow the local drainage criteria and be reviewed by a licensed professional.';

export function Caution() {
  return (
    <p className="caution" role="note" aria-label="Caution">
      <strong>Caution.</strong> {CAUTION_TEXT}
    </p>
  );
}
