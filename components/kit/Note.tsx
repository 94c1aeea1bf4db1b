/**
 * A validity, caution or info message, as the core returns them in `notes`.
 * Cautions link to the Cautions page.
 */
import { For, Show, type JSX } from 'solid-js';
import type { DesignNote, NoteLevel } from '../../src/core/notes';

const LABEL: Record<NoteLevel, string> = { info: 'Note', validity: 'Outside the model', caution: 'Caution' };

export function Note(props: { level: NoteLevel; children: JSX.Element }) {
  return (
    <div class={`tw-note tw-note--${props.level}`} role={props.level === 'caution' ? 'alert' : 'note'}>
      <strong class="tw-note-label">{LABEL[props.level]}:</strong> {props.children}
      <Show when={props.level === 'caution'}>
        {' '}<a href="/cautions/">Read the cautions</a>.
      </Show>
    </div>
  );
}

export function NoteList(props: { notes: readonly DesignNote[] }) {
  return (
    <Show when={props.notes.length > 0}>
      <div class="tw-notes">
        <For each={props.notes}>{(n) => <Note level={n.level}>{n.message}</Note>}</For>
      </div>
    </Show>
  );
}
