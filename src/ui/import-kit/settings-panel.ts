import type { TextRow } from '../../io';

/** The props every import's settings panel takes: the settings in force, what the text split into, and a way to correct a guess. */
export interface SettingsPanelProps<S> {
  readonly settings: S;
  readonly header: readonly string[] | null;
  readonly columnCount: number;
  readonly rows: readonly TextRow[];
  readonly onChange: (patch: Partial<S>) => void;
}
