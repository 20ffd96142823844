import { fmt } from '../design/format';
import { InputError } from '../errors';

/**
 * A span of time as people say it: seconds under a minute, minutes under an
 * hour, else hours; `roundUp` rounds up to three significant digits in the
 * unit shown, so a step suggested is never short of the one needed.
 */
export function stepWords(h: number, roundUp = false): string {
  const [value, unit] = h < 1 / 60 ? [h * 3600, 's'] : h < 1 ? [h * 60, 'min'] : [h, 'h'];
  return `${fmt(roundUp ? upToThreeDigits(value) : value)} ${unit}`;
}

function upToThreeDigits(x: number): number {
  const unit = 10 ** (Math.floor(Math.log10(x)) - 2);
  return Math.ceil(x / unit - 1e-9) * unit;
}

/** What would be too long at the step, in two forms: the step asked for, or the step of a storm's shortest bar. */
interface TooLong {
  /** "The storm lasts 8760 h: 31536001 output steps of 1 s, more than the 10000000 a hydrograph holds" */
  readonly asked: string;
  /** "the storm’s 8760 h would take 31536001 steps of it, more than the 10000000 a hydrograph holds" */
  readonly ofBar: string;
}

/**
 * The refusal of an output step too short for what it must cover (the storm,
 * or the unit response). Its message speaks of the output step, for a caller
 * that asked for one; `forShortestBar` says the same of the storm's shortest
 * bar, for a caller that left the step to it and can act only on the bars.
 */
export class StepTooShort extends InputError {
  private readonly words: TooLong;
  private readonly stepH: number;
  private readonly minStepH: number;

  constructor(words: TooLong, stepH: number, count: number, limit: number) {
    // The count falls as 1/step: the step that brings it to the limit.
    const minStepH = (stepH * count) / limit;
    super('options.stepH', `${words.asked}; an output step of at least ${stepWords(minStepH, true)} would do.`);
    this.words = words;
    this.stepH = stepH;
    this.minStepH = minStepH;
  }

  /** The same refusal, naming bar `index` (0-based), the shortest, whose duration set the step. */
  forShortestBar(index: number): InputError {
    return new InputError(
      'durationsH',
      `The output step is the storm’s shortest bar, bar ${index + 1} (${stepWords(this.stepH)}): ${this.words.ofBar}. ` +
        `Lengthen that bar, or resample the storm to bars of at least ${stepWords(this.minStepH, true)}.`,
      index,
    );
  }
}

/** The storm's `count` steps are more than `limit`. */
export function stormTooLong(totalH: number, stepH: number, count: number, limit: number): StepTooShort {
  const words = {
    asked: `The storm lasts ${fmt(totalH)} h: ${count} output steps of ${stepWords(stepH)}, more than the ${limit} a hydrograph holds`,
    ofBar: `the storm’s ${fmt(totalH)} h would take ${count} steps of it, more than the ${limit} a hydrograph holds`,
  };
  return new StepTooShort(words, stepH, count, limit);
}

/** The unit response's `count` steps are more than `limit`. */
export function responseTooLong(lastingH: number, stepH: number, count: number, limit: number): StepTooShort {
  const words = {
    asked: `The unit hydrograph lasts ${fmt(lastingH)} h: ${count} output steps of ${stepWords(stepH)}, more than the ${limit} kept`,
    ofBar: `the unit hydrograph lasts ${fmt(lastingH)} h, ${count} steps of it, more than the ${limit} kept`,
  };
  return new StepTooShort(words, stepH, count, limit);
}

/** The hydrograph's `count` samples (the storm's steps and the response's) are more than `limit`. */
export function samplesTooMany(stepH: number, count: number, limit: number): StepTooShort {
  const words = {
    asked: `The hydrograph would need ${count} samples of ${stepWords(stepH)}, more than the ${limit} it holds`,
    ofBar: `the hydrograph would need ${count} samples of it, more than the ${limit} it holds`,
  };
  return new StepTooShort(words, stepH, count, limit);
}
