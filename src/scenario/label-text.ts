/**
 * How a parameter's or method's label is written inside a sentence, the one place for it: the undo steps,
 * the matching panel, the report and the compare table all take their words from here.
 */

/** A label inside a sentence: "loss rate φ", but "CN" and "K" keep their capitals ("curve number CN"). */
export function labelInSentence(label: string): string {
  const second = label.charAt(1);
  return second !== '' && second === second.toLowerCase() && second !== second.toUpperCase()
    ? label.charAt(0).toLowerCase() + label.slice(1)
    : label;
}

/** What a scenario is called in a title, a file's first line or a caption: its name, or "Unnamed scenario" when blank. */
export function scenarioTitle(name: string): string {
  return name.trim() === '' ? 'Unnamed scenario' : name;
}
