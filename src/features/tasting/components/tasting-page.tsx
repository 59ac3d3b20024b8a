import { useState } from 'react';
import { useParams } from 'react-router-dom';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { zodResolver } from '@hookform/resolvers/zod';
import {
  Button,
  Card,
  EmptyState,
  ErrorState,
  Loading,
  PageHeader,
  SelectField,
  TextAreaField,
  TextField,
  cx,
  useToast,
} from '../../../components/ui';
import { useCurrentUser } from '../../../lib/current-user';
import { applyServerErrors } from '../../../lib/forms';
import { ROLE_LABELS } from '../../../../shared/schemas/roles';
import {
  BODY,
  CARBONATION_FEEL,
  CLARITY,
  HEAD_RETENTION,
  OFF_FLAVOURS,
  SCORE_MAX,
  SCORE_MIN,
  tastingNoteInputSchema,
  type TastingNote,
  type TastingNoteContent,
  type TastingNoteInput,
} from '../../../../shared/schemas/tasting';
import { useAddTastingNote, useTastingNotes } from '../api/notes';

const SCORES = Array.from({ length: (SCORE_MAX - SCORE_MIN) * 2 + 1 }, (_, i) => SCORE_MIN + i / 2);
const BLANK: TastingNoteContent = {
  appearance: { colour: '', clarity: 'clear', head: 'good' },
  aroma: '',
  flavour: '',
  mouthfeel: { body: 'medium', carbonation: 'medium', notes: '' },
  overall: '',
  offFlavours: [],
  score: 4,
};

const capital = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

function Options({ values }: { values: readonly string[] }) {
  return (
    <>
      {values.map((v) => (
        <option key={v} value={v}>
          {capital(v)}
        </option>
      ))}
    </>
  );
}

/** The form a taster signs. A correction starts from the note it corrects and needs a reason. */
function NoteForm({
  batchId,
  correcting,
  onDone,
}: {
  batchId: number;
  correcting: TastingNote | null;
  onDone: () => void;
}) {
  const add = useAddTastingNote(batchId);
  const toast = useToast();
  const [banner, setBanner] = useState<string | null>(null);
  const { register, handleSubmit, formState, setError } = useForm<
    z.input<typeof tastingNoteInputSchema>,
    unknown,
    TastingNoteInput
  >({
    resolver: zodResolver(tastingNoteInputSchema),
    // The key is made once per note on this device: a retry after a dropped connection records it once.
    defaultValues: {
      idempotencyKey: crypto.randomUUID(),
      content: correcting?.content ?? BLANK,
      ...(correcting ? { correctsNoteId: correcting.id, reason: '' } : {}),
    },
  });
  const e = formState.errors;
  const c = e.content;

  const onSubmit = handleSubmit(async (input) => {
    setBanner(null);
    try {
      await add.mutateAsync(input);
      toast(correcting ? 'Correction signed and saved' : 'Tasting note signed and saved');
      onDone();
    } catch (error) {
      setBanner(applyServerErrors(error, setError));
    }
  });

  return (
    <Card>
      <form
        onSubmit={onSubmit}
        noValidate
        className="space-y-4"
        aria-label={correcting ? 'Correct a tasting note' : 'New tasting note'}
      >
        <h2 className="text-lg font-bold text-ink-900">
          {correcting ? `Correct note #${correcting.id}` : 'Your tasting note'}
        </h2>
        {banner && (
          <p role="alert" className="rounded-lg bg-ember-100 p-3 font-medium text-ember-700">
            {banner}
          </p>
        )}
        <fieldset className="grid gap-3 sm:grid-cols-3">
          <legend className="mb-1 text-sm font-bold uppercase tracking-wide text-ink-500">Appearance</legend>
          <TextField
            label="Colour"
            placeholder="e.g. deep gold"
            {...register('content.appearance.colour')}
            error={c?.appearance?.colour?.message}
          />
          <SelectField
            label="Clarity"
            {...register('content.appearance.clarity')}
            error={c?.appearance?.clarity?.message}
          >
            <Options values={CLARITY} />
          </SelectField>
          <SelectField label="Head" {...register('content.appearance.head')} error={c?.appearance?.head?.message}>
            <Options values={HEAD_RETENTION} />
          </SelectField>
        </fieldset>
        <div className="grid gap-3 sm:grid-cols-2">
          <TextAreaField label="Aroma" rows={3} {...register('content.aroma')} error={c?.aroma?.message} />
          <TextAreaField label="Flavour" rows={3} {...register('content.flavour')} error={c?.flavour?.message} />
        </div>
        <fieldset className="grid gap-3 sm:grid-cols-3">
          <legend className="mb-1 text-sm font-bold uppercase tracking-wide text-ink-500">Mouthfeel</legend>
          <SelectField label="Body" {...register('content.mouthfeel.body')} error={c?.mouthfeel?.body?.message}>
            <Options values={BODY} />
          </SelectField>
          <SelectField
            label="Carbonation"
            {...register('content.mouthfeel.carbonation')}
            error={c?.mouthfeel?.carbonation?.message}
          >
            <Options values={CARBONATION_FEEL} />
          </SelectField>
          <TextField
            label="Mouthfeel notes"
            {...register('content.mouthfeel.notes')}
            error={c?.mouthfeel?.notes?.message}
          />
        </fieldset>
        <fieldset>
          <legend className="text-sm font-bold uppercase tracking-wide text-ink-500">Off-flavours noticed</legend>
          <div className="mt-1 grid gap-1 sm:grid-cols-2 lg:grid-cols-3">
            {Object.entries(OFF_FLAVOURS).map(([id, f]) => (
              <label key={id} className="flex min-h-touch items-center gap-2">
                <input
                  type="checkbox"
                  value={id}
                  {...register('content.offFlavours')}
                  className="h-5 w-5 accent-ember-600"
                />
                <span>
                  <span className="font-medium">{f.label}</span>{' '}
                  <span className="text-sm text-ink-500">({f.hint})</span>
                </span>
              </label>
            ))}
          </div>
          {c?.offFlavours && <p className="text-sm text-ember-700">{c.offFlavours.message}</p>}
        </fieldset>
        <div className="grid gap-3 sm:grid-cols-[3fr_1fr]">
          <TextAreaField
            label="Overall impression"
            rows={3}
            {...register('content.overall')}
            error={c?.overall?.message}
          />
          <SelectField
            label="Score (1–5)"
            className="text-2xl font-semibold"
            {...register('content.score', { setValueAs: Number })}
            error={c?.score?.message}
          >
            {SCORES.map((s) => (
              <option key={s} value={s}>
                {s.toFixed(1)}
              </option>
            ))}
          </SelectField>
        </div>
        {correcting && (
          <TextField label="Why this corrects the note" {...register('reason')} error={e.reason?.message} />
        )}
        <p className="text-sm text-ink-500">
          Saving signs the note with your name and the time. A signed note is never changed: to fix one, add a
          correction.
        </p>
        <div className="flex gap-2">
          <Button type="submit" size="lg" busy={add.isPending}>
            {correcting ? 'Sign the correction' : 'Sign and save note'}
          </Button>
          {correcting && (
            <Button variant="secondary" size="lg" onClick={onDone}>
              Cancel
            </Button>
          )}
        </div>
      </form>
    </Card>
  );
}

function NoteCard({
  note,
  mine,
  onCorrect,
  timeZone,
}: {
  note: TastingNote;
  mine: boolean;
  onCorrect: () => void;
  timeZone: string;
}) {
  const s = note.signature;
  const corrected = note.correctedBy.length > 0;
  const c = note.content;
  const signedAt = new Intl.DateTimeFormat('en-GB', {
    day: 'numeric',
    month: 'short',
    year: 'numeric',
    hour: '2-digit',
    minute: '2-digit',
    timeZone,
    timeZoneName: 'short',
  }).format(new Date(s.signedAt));
  return (
    <Card aria-label={`Tasting note ${note.id}`} className={cx(corrected && 'opacity-70')}>
      <div className="flex flex-wrap items-start justify-between gap-3">
        <div>
          <p className="font-semibold text-ink-900">
            Note #{note.id} · {s.authorName} ({ROLE_LABELS[s.authorRole]})
          </p>
          <p className="text-sm text-ink-500">Signed {signedAt} — author of this note</p>
          {note.correctsNoteId && (
            <p className="text-sm text-sky-700">
              Corrects note #{note.correctsNoteId}: {note.reason}
            </p>
          )}
          {corrected && (
            <p className="text-sm font-semibold text-ink-700">Corrected by note #{note.correctedBy.join(', #')}</p>
          )}
        </div>
        <p className="text-4xl font-semibold tabular-nums text-ink-900">
          {c.score.toFixed(1)}
          <span className="text-base text-ink-500"> / 5</span>
        </p>
      </div>
      <dl className={cx('mt-3 grid gap-x-6 gap-y-1 text-sm sm:grid-cols-2', corrected && 'line-through')}>
        <div>
          <dt className="inline font-semibold">Appearance: </dt>
          <dd className="inline">
            {c.appearance.colour}, {c.appearance.clarity}, {c.appearance.head} head
          </dd>
        </div>
        <div>
          <dt className="inline font-semibold">Mouthfeel: </dt>
          <dd className="inline">
            {c.mouthfeel.body} body, {c.mouthfeel.carbonation} carbonation
            {c.mouthfeel.notes ? `, ${c.mouthfeel.notes}` : ''}
          </dd>
        </div>
        <div>
          <dt className="inline font-semibold">Aroma: </dt>
          <dd className="inline">{c.aroma}</dd>
        </div>
        <div>
          <dt className="inline font-semibold">Flavour: </dt>
          <dd className="inline">{c.flavour}</dd>
        </div>
        <div className="sm:col-span-2">
          <dt className="inline font-semibold">Overall: </dt>
          <dd className="inline">{c.overall}</dd>
        </div>
        <div className="sm:col-span-2">
          <dt className="inline font-semibold">Off-flavours: </dt>
          <dd className="inline">
            {c.offFlavours.length ? c.offFlavours.map((o) => OFF_FLAVOURS[o].label).join(', ') : 'none noted'}
          </dd>
        </div>
      </dl>
      <div className="mt-3 flex flex-wrap items-center justify-between gap-2">
        {s.valid ? (
          <p className="text-sm text-cellar-700">✓ Signature matches the note</p>
        ) : (
          <p role="alert" className="text-sm font-semibold text-ember-700">
            ✗ Signature does not match: this note was changed after it was signed
          </p>
        )}
        {mine && !corrected && (
          <Button variant="secondary" onClick={onCorrect}>
            Correct this note
          </Button>
        )}
      </div>
    </Card>
  );
}

/** A batch's tasting panel: every taster's signed note, and the form to add one. */
export function TastingPage() {
  const batchId = Number(useParams().batchId);
  const me = useCurrentUser();
  const notes = useTastingNotes(batchId);
  const [correcting, setCorrecting] = useState<TastingNote | null>(null);
  const [formKey, setFormKey] = useState(0);
  const done = () => {
    setCorrecting(null);
    setFormKey((k) => k + 1);
  };

  return (
    <>
      <PageHeader
        title="Tasting notes"
        subtitle="Each taster signs their own note. The taproom sees the average score and the latest aroma and flavour."
      />
      <div className="grid gap-6 xl:grid-cols-2">
        <NoteForm
          key={`${formKey}-${correcting?.id ?? 'new'}`}
          batchId={batchId}
          correcting={correcting}
          onDone={done}
        />
        <section aria-label="Signed notes" className="space-y-4">
          {notes.isPending ? (
            <Loading label="Loading notes" />
          ) : notes.isError ? (
            <ErrorState error={notes.error} onRetry={() => notes.refetch()} />
          ) : notes.data.length === 0 ? (
            <EmptyState title="No tasting notes yet" />
          ) : (
            [...notes.data]
              .reverse()
              .map((n) => (
                <NoteCard
                  key={n.id}
                  note={n}
                  mine={n.signature.authorId === me.id}
                  timeZone={me.brewery.timeZone}
                  onCorrect={() => setCorrecting(n)}
                />
              ))
          )}
        </section>
      </div>
    </>
  );
}
