/**
 * Notes the core returns beside its values: where an input lies outside a
 * model's stated range of validity, where a result implies danger, or a
 * plain remark a technician should see. Workbenches show them as they are.
 */
import { DesignError } from './errors';

export type NoteLevel = 'info' | 'validity' | 'caution';

export interface DesignNote {
  /** `validity`: a model is used outside its published range; `caution`: a hazard or rating exceeded. */
  level: NoteLevel;
  /** One or two sentences, in the trade's words. */
  message: string;
  /** The input this note is about, when there is one (same name as the argument). */
  field?: string;
}

const LEVELS: readonly NoteLevel[] = ['info', 'validity', 'caution'];

/**
 * A note: `level` one of 'info', 'validity', 'caution'; `message` the sentence;
 * `field` the input it is about, if any.
 * @throws DesignError for an unknown level or a message or field that is not text
 */
export function note(level: NoteLevel, message: string, field?: string): DesignNote {
  if (!LEVELS.includes(level)) {
    throw new DesignError('level', `A note's level must be "info", "validity" or "caution" (got ${typeof level === 'string' ? JSON.stringify(level) : String(level)}).`);
  }
  if (typeof message !== 'string' || message === '') throw new DesignError('message', 'A note needs its sentence as text.');
  if (field !== undefined && typeof field !== 'string') throw new DesignError('field', 'A note\'s field must be the name of an input, as text.');
  return field === undefined ? { level, message } : { level, message, field };
}
