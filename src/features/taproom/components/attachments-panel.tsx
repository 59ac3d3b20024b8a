import { useRef, useState } from 'react';
import { Card, ErrorState, Loading } from '../../../components/ui';
import { ApiError } from '../../../lib/api-client';
import { UPLOAD_ACCEPT, UPLOAD_MAX_BYTES } from '../../../../shared/schemas/taproom';
import { useAttachments, useRemoveAttachment, useUploadAttachment } from '../api/attachments';
import { useCan } from '../../../lib/current-user';
import { ConfirmButton } from '../../../components/confirm-button';

const sizeText = (bytes: number) =>
  bytes >= 1024 * 1024 ? `${(bytes / 1024 / 1024).toFixed(1)} MB` : `${Math.max(1, Math.round(bytes / 1024))} KB`;

/** Photos and lab sheets on a batch: add one, see them all, open each; the head brewer removes a wrong one. */
export function AttachmentsPanel({ batchId }: { batchId: number }) {
  const files = useAttachments(batchId);
  const upload = useUploadAttachment(batchId);
  const remove = useRemoveAttachment(batchId);
  const canRemove = useCan('file.remove');
  const input = useRef<HTMLInputElement>(null);
  const [problem, setProblem] = useState<string | null>(null);

  async function send(file: File | undefined) {
    setProblem(null);
    if (!file) return;
    if (file.size > UPLOAD_MAX_BYTES) {
      setProblem(`${file.name} is ${sizeText(file.size)}; files can be at most ${UPLOAD_MAX_BYTES / 1024 / 1024} MB.`);
      return;
    }
    try {
      await upload.mutateAsync(file);
    } catch (error) {
      setProblem(error instanceof ApiError ? error.message : 'The file could not be sent. Try again.');
    } finally {
      if (input.current) input.current.value = '';
    }
  }

  return (
    <Card>
      <h2 className="text-lg font-bold text-ink-900">Photos and lab sheets</h2>
      <p className="mt-1 text-sm text-ink-500">JPEG, PNG or WebP photos and PDF lab sheets, up to 15 MB each.</p>
      <label className="mt-3 block">
        <span className="sr-only">Add a photo or lab sheet</span>
        <input
          ref={input}
          type="file"
          accept={UPLOAD_ACCEPT}
          aria-label="Add a photo or lab sheet"
          disabled={upload.isPending}
          onChange={(e) => send(e.target.files?.[0])}
          className="block w-full min-h-touch text-sm file:mr-3 file:min-h-touch file:rounded-lg file:border-0 file:bg-cellar-800 file:px-4 file:font-semibold file:text-white"
        />
      </label>
      {upload.isPending && <Loading label="Sending the file" />}
      {problem && (
        <p role="alert" className="mt-2 text-sm font-medium text-ember-700">
          {problem}
        </p>
      )}
      {files.isPending ? (
        <Loading label="Loading files" />
      ) : files.isError ? (
        <ErrorState error={files.error} onRetry={() => files.refetch()} />
      ) : files.data.length === 0 ? (
        <p className="mt-3 text-ink-500">Nothing attached yet.</p>
      ) : (
        <ul className="mt-3 grid grid-cols-2 gap-3">
          {files.data.map((f) => (
            <li key={f.id} className="rounded-lg border border-mist-200 p-2 text-sm">
              <a href={f.url} target="_blank" rel="noreferrer" className="block">
                {f.thumbnailUrl ? (
                  <img src={f.thumbnailUrl} alt={f.displayName} className="h-24 w-full rounded object-cover" />
                ) : (
                  <span className="flex h-24 items-center justify-center rounded bg-mist-100 font-semibold text-ink-700">
                    PDF
                  </span>
                )}
                <span className="mt-1 block truncate font-medium text-cellar-700">{f.displayName}</span>
              </a>
              <span className="text-ink-500">
                {sizeText(f.byteSize)} · {f.uploadedBy}
              </span>
              {canRemove && (
                <ConfirmButton
                  ask="Remove…"
                  confirm="Remove this file"
                  act={() => remove.mutateAsync(f.id)}
                  onRefused={(error) =>
                    setProblem(error instanceof ApiError ? error.message : 'The file could not be removed. Try again.')
                  }
                />
              )}
            </li>
          ))}
        </ul>
      )}
    </Card>
  );
}
