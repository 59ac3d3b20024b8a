import { useState } from 'react';
import type { NoteEntryInput } from '../../shared/schemas/batch-log';
import { outbox } from '../lib/outbox';
import type { OutboxItem } from '../lib/outbox-queue';
import { showTime } from '../lib/time';
import { Button, TextAreaField } from './ui';

/** The note's longest text (the note schema's limit). */
const NOTE_MAX = 2000;

/** What the note says by default: the entry as typed, when, and why it was not saved. */
const noteText = (item: OutboxItem, timeZone: string) =>
  `Typed on the tablet at ${showTime(item.capturedAt, timeZone)} and not saved: ${item.label}. ${item.message ?? ''}`
    .trim()
    .slice(0, NOTE_MAX);

/**
 * An entry the server refused for good, set aside on this tablet: the values as typed beside the server's reason.
 * Its author can send it again as a note on the batch (the reason prefilled) or discard it after confirming.
 */
export function SetAsideEntry({
  item,
  mine,
  noteUrl,
  timeZone,
}: {
  item: OutboxItem;
  mine: boolean;
  /** Where the batch's notes are posted. */
  noteUrl: string;
  timeZone: string;
}) {
  const [text, setText] = useState(() => noteText(item, timeZone));
  const [discarding, setDiscarding] = useState(false);
  const sendAsNote = () => {
    const body: NoteEntryInput = { kind: 'note', text: text.trim(), deviation: false, meaning: 'performed' };
    void outbox().resendAs(item.idempotencyKey, {
      url: noteUrl,
      body,
      label: `Note: ${body.text.slice(0, 40)}`,
      group: item.group,
    });
  };
  return (
    <li className="mt-3 rounded-lg bg-ember-100 p-3 text-ember-700" data-testid="set-aside-item">
      <p className="font-semibold">Not saved: {item.label}</p>
      <p className="text-sm">
        Typed {showTime(item.capturedAt, timeZone)} by {item.authorName}
      </p>
      <p role="alert">{item.message}</p>
      {!mine ? (
        <p className="mt-1 text-sm">{item.authorName} can send it as a note or discard it once signed in.</p>
      ) : discarding ? (
        <div className="mt-2 flex flex-wrap items-center gap-2">
          <span>Discard it from this tablet? It is not in the batch record.</span>
          <Button variant="danger" onClick={() => void outbox().dismiss(item.idempotencyKey)}>
            Discard for good
          </Button>
          <Button variant="quiet" onClick={() => setDiscarding(false)}>
            Keep it
          </Button>
        </div>
      ) : (
        <div className="mt-2 space-y-2 text-ink-900">
          <TextAreaField
            label="Note for the batch record"
            rows={3}
            maxLength={NOTE_MAX}
            value={text}
            onChange={(e) => setText(e.target.value)}
          />
          <div className="flex flex-wrap gap-2">
            <Button disabled={!text.trim()} onClick={sendAsNote}>
              Send as a note
            </Button>
            <Button variant="quiet" onClick={() => setDiscarding(true)}>
              Discard…
            </Button>
          </div>
        </div>
      )}
    </li>
  );
}
