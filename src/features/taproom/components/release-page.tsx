import { useState } from 'react';
import { useParams } from 'react-router-dom';
import { useController, useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import {
  Button,
  Card,
  Caution,
  Dialog,
  ErrorState,
  Loading,
  PageHeader,
  SelectField,
  Stat,
  TextAreaField,
  TextField,
  useToast,
} from '../../../components/ui';
import { useCurrentUser, useCan } from '../../../lib/current-user';
import { showTime } from '../../../lib/time';
import { FormBanner } from '../../../components/ui/form-banner';
import { ConfirmButton } from '../../../components/confirm-button';
import { applyServerErrors } from '../../../lib/forms';
import { show } from '../../../lib/units';
import {
  ALLERGENS,
  GLASSES,
  releaseSheetSchema,
  wasReleased,
  type ReleaseDetail,
  type ReleaseSheet,
  type ReleaseSheetInput,
} from '../../../../shared/schemas/taproom';
import { useRelease, usePublishRelease, useSaveReleaseSheet, useSetOnTap } from '../api/release';
import { useAttachments } from '../api/attachments';
import { AttachmentsPanel } from './attachments-panel';
import { ColourSwatch, packagesLine } from './beer-facts';

/** Serving temperatures offered, °C (shown in the brewery's units). Common cellar-to-cool range, no source. */
const SERVING_TEMPS_C = [2, 4, 6, 8, 10, 12, 14];
const STATE_LABELS = {
  draft: 'Draft (not shown to the taproom)',
  coming_soon: 'Coming soon (shown to the taproom)',
  on_tap: 'On tap',
  off_tap: 'Off tap (kept for the record)',
} as const;
const METHOD_LABELS = {
  balling: "Balling's formula (Hall, 1995)",
  simple: '(OG − FG) × 131.25',
  hall: 'Hall’s formula',
} as const;

const sg = (v: number | null) => (v === null ? '—' : v.toFixed(3));

function defaults(detail: ReleaseDetail): ReleaseSheetInput {
  return (
    detail.sheet ?? {
      beerName: detail.batch.beerName,
      style: detail.batch.style,
      description: '',
      glass: 'nonic_pint',
      servingTempC: 6,
      servingNotes: '',
      allergens: ['gluten'],
      photoAttachmentId: null,
      comingSoon: false,
    }
  );
}

function SheetForm({ batchId, detail }: { batchId: number; detail: ReleaseDetail }) {
  const me = useCurrentUser();
  const mayRelease = useCan('release.manage');
  const toast = useToast();
  const save = useSaveReleaseSheet(batchId);
  const photos = useAttachments(batchId).data?.filter((a) => a.kind === 'photo') ?? [];
  const [banner, setBanner] = useState<string | null>(null);
  const form = useForm<ReleaseSheetInput, unknown, ReleaseSheet>({
    resolver: zodResolver(releaseSheetSchema),
    defaultValues: defaults(detail),
  });
  const { register, handleSubmit, formState, setError, reset, control } = form;
  // Radio values are strings; the sheet holds the attachment's id (or null), so the group is controlled.
  const photo = useController({ control, name: 'photoAttachmentId' });
  const errors = formState.errors;

  const onSubmit = handleSubmit(async (sheet) => {
    setBanner(null);
    try {
      const saved = await save.mutateAsync(sheet);
      reset(defaults(saved));
      toast('Release sheet saved');
    } catch (error) {
      setBanner(applyServerErrors(error, setError));
    }
  });

  return (
    <Card>
      <form onSubmit={onSubmit} className="space-y-4" aria-label="Release sheet" noValidate>
        <h2 className="text-lg font-bold text-ink-900">Release sheet</h2>
        {!mayRelease && (
          <p className="rounded-lg bg-mist-100 p-3 text-ink-700">
            Read only: a head brewer writes and releases the sheet.
          </p>
        )}
        <fieldset disabled={!mayRelease} className="space-y-4">
          <FormBanner message={banner} />
          <div className="grid gap-4 sm:grid-cols-2">
            <TextField label="Beer name" {...register('beerName')} error={errors.beerName?.message} />
            <TextField label="Style" {...register('style')} error={errors.style?.message} />
          </div>
          <TextAreaField
            label="Taproom description"
            hint="Public-facing: guests and staff read this."
            rows={5}
            {...register('description')}
            error={errors.description?.message}
          />
          <div className="grid gap-4 sm:grid-cols-2">
            <SelectField label="Glass" {...register('glass')} error={errors.glass?.message}>
              {Object.entries(GLASSES).map(([id, label]) => (
                <option key={id} value={id}>
                  {label}
                </option>
              ))}
            </SelectField>
            <SelectField
              label="Serving temperature"
              {...register('servingTempC', { setValueAs: Number })}
              error={errors.servingTempC?.message}
            >
              {SERVING_TEMPS_C.map((c) => (
                <option key={c} value={c}>
                  {show(me.brewery.unitSystem, 'temperature', c, 0)}
                </option>
              ))}
            </SelectField>
          </div>
          <TextField
            label="Serving notes"
            placeholder="e.g. pour with a finger of head"
            {...register('servingNotes')}
            error={errors.servingNotes?.message}
          />
          <fieldset>
            <legend className="text-sm font-semibold text-ink-700">Allergens</legend>
            <div className="mt-1 grid grid-cols-2 gap-1 sm:grid-cols-3">
              {Object.entries(ALLERGENS).map(([id, label]) => (
                <label key={id} className="flex min-h-touch items-center gap-2">
                  <input type="checkbox" value={id} {...register('allergens')} className="h-5 w-5 accent-cellar-700" />
                  {label}
                </label>
              ))}
            </div>
            {errors.allergens && <p className="text-sm text-ember-700">{errors.allergens.message}</p>}
          </fieldset>
          <fieldset>
            <legend className="text-sm font-semibold text-ink-700">Photo for the taproom</legend>
            <div className="mt-1 flex flex-wrap gap-3">
              {[null, ...photos].map((p) => (
                <label key={p?.id ?? 'none'} className="flex min-h-touch items-center gap-2">
                  <input
                    type="radio"
                    name={photo.field.name}
                    checked={photo.field.value === (p?.id ?? null)}
                    onChange={() => photo.field.onChange(p?.id ?? null)}
                    className="h-5 w-5"
                  />
                  {p ? (
                    <img src={p.thumbnailUrl ?? p.url} alt={p.displayName} className="h-12 w-12 rounded object-cover" />
                  ) : (
                    'No photo'
                  )}
                </label>
              ))}
            </div>
            {errors.photoAttachmentId && <p className="text-sm text-ember-700">{errors.photoAttachmentId.message}</p>}
          </fieldset>
          {!wasReleased(detail.state) && (
            <label className="flex min-h-touch items-center gap-2">
              <input type="checkbox" {...register('comingSoon')} className="h-5 w-5 accent-cellar-700" />
              Show to the taproom as coming soon
            </label>
          )}
        </fieldset>
        {mayRelease && (
          <Button type="submit" size="lg" busy={save.isPending}>
            Save release sheet
          </Button>
        )}
      </form>
    </Card>
  );
}

/** " on Dec 2, 2026, 14:05 AST" in the brewery's time zone, or nothing without a time. */
function useStamp() {
  const { timeZone } = useCurrentUser().brewery;
  return (iso: string | null) => (iso ? ` on ${showTime(iso, timeZone, true)}` : '');
}

/** A released beer: who released it and when, and taking it off tap when it runs out (or back on). */
function TapState({ batchId, detail }: { batchId: number; detail: ReleaseDetail }) {
  const stamp = useStamp();
  const toast = useToast();
  const setOnTap = useSetOnTap(batchId);
  const [problem, setProblem] = useState<string | null>(null);
  const name = detail.sheet?.beerName ?? detail.batch.beerName;
  const released = `released by ${detail.releasedBy ?? 'the head brewer'}${stamp(detail.releasedAt)}`;
  const refused = (error: unknown) =>
    setProblem(error instanceof Error ? error.message : 'That did not go through. Try again.');
  const alert = <FormBanner message={problem} />;

  if (detail.state === 'on_tap') {
    return (
      <div className="space-y-3">
        <p className="rounded-lg bg-cellar-100 p-3 font-semibold text-cellar-800">On tap, {released}.</p>
        <p className="text-sm text-ink-700">
          When it runs out, take it off tap: it leaves the taproom’s list and the bar screen. Its sheet, numbers and
          tasting notes are kept.
        </p>
        <ConfirmButton
          ask="Take off tap…"
          confirm={`Take ${name} off tap`}
          act={() => setOnTap.mutateAsync(false)}
          onDone={() => toast(`${name} is off tap`)}
          onRefused={refused}
        />
        {alert}
      </div>
    );
  }
  return (
    <div className="space-y-3">
      <p className="rounded-lg bg-mist-100 p-3 font-semibold text-ink-700">
        Off tap{detail.offTapBy ? `, taken off by ${detail.offTapBy}` : ''}
        {stamp(detail.offTapAt)}. It was {released}.
      </p>
      <Button
        variant="secondary"
        busy={setOnTap.isPending}
        onClick={async () => {
          setProblem(null);
          try {
            await setOnTap.mutateAsync(true);
            toast(`${name} is back on tap`);
          } catch (error) {
            refused(error);
          }
        }}
      >
        Put back on tap
      </Button>
      {alert}
    </div>
  );
}

function ReleaseNumbers({
  batchId,
  detail,
  sheetSaved,
}: {
  batchId: number;
  detail: ReleaseDetail;
  sheetSaved: boolean;
}) {
  const mayRelease = useCan('release.manage');
  const publish = usePublishRelease(batchId);
  const toast = useToast();
  const [confirming, setConfirming] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const n = detail.numbers;
  const released = wasReleased(detail.state);
  const blockers = [
    !sheetSaved && 'Save the release sheet first.',
    detail.batch.status !== 'packaged' && !released && 'The batch must be packaged first.',
    n.og === null && 'The measured OG is not on the brew-day log yet.',
    n.fg === null && 'There is no gravity reading yet.',
  ].filter(Boolean) as string[];

  async function release() {
    setProblem(null);
    try {
      await publish.mutateAsync({ confirmedOg: n.og!, confirmedFg: n.fg! });
      setConfirming(false);
      toast('Released to the taproom');
    } catch (error) {
      setProblem(error instanceof Error ? error.message : 'The release did not go through. Try again.');
    }
  }

  return (
    <Card className="space-y-4">
      <h2 className="text-lg font-bold text-ink-900">{released ? 'Released numbers' : 'Final numbers'}</h2>
      <div className="grid grid-cols-2 gap-3">
        <Stat label="OG (measured)" value={sg(n.og)} />
        <Stat label="FG (last reading)" value={sg(n.fg)} />
        <Stat label="ABV" value={n.abvPct === null ? '—' : n.abvPct.toFixed(1)} unit="%" />
        <Stat label="IBU (planned)" value={n.ibu.toFixed(0)} />
      </div>
      <p className="text-sm text-ink-500">
        ABV from the measured OG and FG by {METHOD_LABELS[n.abvMethod]}. Planned ABV was {n.plannedAbvPct.toFixed(1)} %.
      </p>
      <div className="flex items-center gap-3">
        <ColourSwatch srm={n.srm} size="lg" />
        <span className="text-ink-700">Colour from the plan</span>
      </div>
      <p className="text-ink-700">
        <span className="font-semibold">Packaged: </span>
        {detail.packageSizes.length ? packagesLine(detail.packageSizes) : 'nothing yet'}
      </p>
      {!mayRelease ? null : released ? (
        <TapState batchId={batchId} detail={detail} />
      ) : (
        <>
          {blockers.length > 0 && (
            <ul className="list-disc pl-5 text-sm text-ink-700">
              {blockers.map((b) => (
                <li key={b}>{b}</li>
              ))}
            </ul>
          )}
          <Button size="lg" disabled={blockers.length > 0} onClick={() => setConfirming(true)}>
            Release to the taproom
          </Button>
        </>
      )}
      <Dialog open={confirming} onClose={() => setConfirming(false)} title="Confirm the final numbers">
        <p className="text-ink-700">
          OG <strong>{sg(n.og)}</strong>, FG <strong>{sg(n.fg)}</strong>, ABV <strong>{n.abvPct?.toFixed(1)} %</strong>,{' '}
          {n.ibu.toFixed(0)} IBU. The batch moves to released and the beer appears on the taproom’s tap list.
        </p>
        <div className="mt-3">
          <FormBanner message={problem} />
        </div>
        <div className="mt-4 flex justify-end gap-2">
          <Button variant="secondary" onClick={() => setConfirming(false)}>
            Not yet
          </Button>
          <Button busy={publish.isPending} onClick={release}>
            Confirm and release
          </Button>
        </div>
      </Dialog>
      <Caution title="Alcohol content on labels">
        The ABV here is computed from your logged gravities. Labelling rules and tolerances differ by country; check
        yours before printing labels.
      </Caution>
    </Card>
  );
}

/** The head brewer's release of one batch: the public sheet, photos and lab sheets, the final numbers and the release itself. */
export function ReleasePage() {
  const batchId = Number(useParams().batchId);
  const detail = useRelease(batchId);
  if (detail.isPending) return <Loading label="Opening the release" />;
  if (detail.isError) return <ErrorState error={detail.error} onRetry={() => detail.refetch()} />;
  const d = detail.data;
  return (
    <>
      <PageHeader
        title={`Release ${d.sheet?.beerName ?? d.batch.beerName}`}
        subtitle={`Batch ${d.batch.number} · ${d.state ? STATE_LABELS[d.state] : 'No release sheet yet'}`}
      />
      <div className="grid gap-6 lg:grid-cols-[3fr_2fr]">
        <SheetForm key={d.state ?? 'new'} batchId={batchId} detail={d} />
        <div className="space-y-6">
          <ReleaseNumbers batchId={batchId} detail={d} sheetSaved={d.sheet !== null} />
          <AttachmentsPanel batchId={batchId} />
        </div>
      </div>
    </>
  );
}
