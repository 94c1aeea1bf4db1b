/**
 * Notes the core returns beside its values: where an input lies outside a
 * model's stated range of validity, where a result implies danger, or a
 * plain remark a technician should see. Workbenches show them as they are.
 */
export type NoteLevel = 'info' | 'validity' | 'caution';

export interface DesignNote {
  /** `validity`: a model is used outside its published range; `caution`: a hazard or rating exceeded. */
  level: NoteLevel;
  /** One or two sentences, in the trade's words. */
  message: string;
  /** The input this note is about, when there is one (same name as the argument). */
  field?: string;
}

export function note(level: NoteLevel, message: string, field?: string): DesignNote {
  return field === undefined ? { level, message } : { level, message, field };
}
