import { useState } from 'react';
import type { Signature } from '../../../../shared/schemas/batch-log';
import { MEANING_LABELS } from '../../../../shared/schemas/batch-log';
import { Button, Card, TextField } from '../../../components/ui';
import { ApiError } from '../../../lib/api-client';
import { useOnline } from './use-online';
import { useSignOff } from '../api/sign-off';
import { showTime } from '../../../lib/time';

/** Every signature with printed name, date and time with zone, and meaning; flagged when what was signed changed. */
export function Signatures({ signatures, timeZone }: { signatures: Signature[]; timeZone: string }) {
  return (
    <ul className="space-y-2">
      {signatures.map((s) => (
        <li
          key={s.entryId}
          className={s.valid ? 'rounded-lg bg-cellar-100 p-3' : 'rounded-lg bg-ember-100 p-3 text-ember-700'}
          data-testid="signature"
        >
          <p className="font-semibold">
            {MEANING_LABELS[s.meaning]} {s.signerName}
          </p>
          <p className="tabular-nums">{showTime(s.signedAt, timeZone, true)}</p>
          <p className="text-sm">
            {s.valid
              ? 'Signature valid: the record is as signed.'
              : 'Signature invalid: the record has changed since it was signed.'}
          </p>
          <p className="break-all font-mono text-xs text-ink-500">SHA-256 {s.contentSha256}</p>
        </li>
      ))}
    </ul>
  );
}

/** The head brewer signs the brew day off with their password; never offline. */
export function SignOffPanel({ batchId, pendingCount }: { batchId: number; pendingCount: number }) {
  const [password, setPassword] = useState('');
  const signOff = useSignOff(batchId);
  const online = useOnline();
  const error =
    signOff.error instanceof ApiError ? (signOff.error.fields.password ?? signOff.error.message) : undefined;
  const blocked = !online
    ? 'Signing needs the network: wait for the connection.'
    : pendingCount > 0
      ? 'Wait until every entry on this tablet has been sent.'
      : null;
  return (
    <Card className="p-4">
      <h2 className="text-lg font-bold">Sign off the brew day</h2>
      <p className="text-sm text-ink-500">Meaning: reviewed. After sign-off, brew-day entries can only be corrected.</p>
      <form
        className="mt-3 space-y-3"
        onSubmit={(e) => {
          e.preventDefault();
          signOff.mutate({ password }, { onSuccess: () => setPassword('') });
        }}
      >
        <TextField
          label="Your password"
          type="password"
          autoComplete="current-password"
          value={password}
          onChange={(e) => setPassword(e.target.value)}
          error={error}
        />
        {blocked && <p className="font-medium text-ember-700">{blocked}</p>}
        <Button type="submit" size="lg" busy={signOff.isPending} disabled={Boolean(blocked) || !password}>
          Sign as reviewed
        </Button>
      </form>
    </Card>
  );
}
