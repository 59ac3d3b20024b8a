import { useState } from 'react';
import { Button, SelectField, Table, Td, Th, cx } from '../../../components/ui';
import type { ProbeImportInput, ProbeImportResult } from '../../../../shared/schemas/cellar';
import { ApiError } from '../../../lib/api-client';
import { useImportReadings, usePreviewImport } from '../api/probe-import';
import { TimeZoneOptions } from '../../../components/ui/time-zone-options';

type Options = Omit<ProbeImportInput, 'csv'>;

/** Import a logging probe's CSV: choose delimiter, units and time zone, check every row, then confirm. */
export function ProbeImport({
  batchId,
  timeZone,
  unitSystem,
}: {
  batchId: number;
  timeZone: string;
  unitSystem: 'us' | 'metric';
}) {
  const [csv, setCsv] = useState<string>();
  const [fileName, setFileName] = useState<string>();
  const [options, setOptions] = useState<Options>({
    delimiter: ',',
    gravityUnit: 'sg',
    tempUnit: unitSystem === 'us' ? 'f' : 'c',
    timeZone,
  });
  const [preview, setPreview] = useState<ProbeImportResult>();
  const [done, setDone] = useState<string>();
  // One key per file and options: a repeated confirm replays instead of importing twice.
  const [key, setKey] = useState(() => crypto.randomUUID());
  const check = usePreviewImport(batchId);
  const commit = useImportReadings(batchId);

  const change = (next: Partial<Options>) => {
    setOptions((o) => ({ ...o, ...next }));
    setPreview(undefined);
    setKey(crypto.randomUUID());
  };
  const run = async () => {
    if (!csv) return;
    setDone(undefined);
    setPreview(await check.mutateAsync({ ...options, csv }));
  };
  const confirm = async () => {
    if (!csv) return;
    const result = await commit.mutateAsync({ input: { ...options, csv }, idempotencyKey: key });
    setDone(
      `Imported ${result.toImport} reading${result.toImport === 1 ? '' : 's'}; ${result.duplicates} duplicate${result.duplicates === 1 ? '' : 's'} skipped.`,
    );
    setPreview(undefined);
    setCsv(undefined);
    setFileName(undefined);
  };
  const error = check.error ?? commit.error;

  return (
    <div className="space-y-3">
      <label className="block">
        <span className="mb-1 block text-sm font-semibold text-ink-700">
          Probe export (CSV: time, gravity, temperature)
        </span>
        <input
          type="file"
          accept=".csv,text/csv,text/plain"
          className="block min-h-touch w-full text-base"
          onChange={async (e) => {
            const file = e.target.files?.[0];
            setPreview(undefined);
            setFileName(file?.name);
            setCsv(file ? await file.text() : undefined);
            setKey(crypto.randomUUID());
          }}
        />
      </label>
      <div className="grid grid-cols-2 gap-3 lg:grid-cols-4">
        <SelectField
          label="Delimiter"
          value={options.delimiter}
          onChange={(e) => change({ delimiter: e.target.value as Options['delimiter'] })}
        >
          <option value=",">Comma</option>
          <option value=";">Semicolon</option>
          <option value={'\t'}>Tab</option>
        </SelectField>
        <SelectField
          label="Gravity in"
          value={options.gravityUnit}
          onChange={(e) => change({ gravityUnit: e.target.value as Options['gravityUnit'] })}
        >
          <option value="sg">SG</option>
          <option value="plato">°P</option>
        </SelectField>
        <SelectField
          label="Temperature in"
          value={options.tempUnit}
          onChange={(e) => change({ tempUnit: e.target.value as Options['tempUnit'] })}
        >
          <option value="c">°C</option>
          <option value="f">°F</option>
        </SelectField>
        <SelectField
          label="Times are in"
          value={options.timeZone}
          onChange={(e) => change({ timeZone: e.target.value })}
        >
          <TimeZoneOptions />
        </SelectField>
      </div>
      <Button variant="secondary" disabled={!csv} busy={check.isPending} onClick={run}>
        Check {fileName ?? 'the file'}
      </Button>
      {error && (
        <p role="alert" className="rounded-lg bg-ember-100 p-3 text-ember-700">
          {error.message}
          {error instanceof ApiError &&
            Object.keys(error.fields).length > 0 &&
            ` (${Object.keys(error.fields).length} rows)`}
        </p>
      )}
      {done && (
        <p role="status" className="rounded-lg bg-cellar-100 p-3 font-semibold">
          {done}
        </p>
      )}
      {preview && (
        <>
          <p className="font-semibold" data-testid="import-summary">
            {preview.toImport} to import · {preview.duplicates} duplicate{preview.duplicates === 1 ? '' : 's'} to skip ·{' '}
            <span className={cx(preview.errors > 0 && 'text-ember-700')}>{preview.errors} with errors</span>
          </p>
          <div className="max-h-80 overflow-y-auto">
            <Table>
              <thead>
                <tr>
                  <Th>Line</Th>
                  <Th>Time</Th>
                  <Th>Gravity</Th>
                  <Th>Temp</Th>
                  <Th>Check</Th>
                </tr>
              </thead>
              <tbody>
                {preview.rows.map((r) => (
                  <tr
                    key={r.line}
                    className={cx(r.status === 'error' && 'bg-ember-100', r.status === 'duplicate' && 'text-ink-500')}
                  >
                    <Td>{r.line}</Td>
                    <Td>{r.time}</Td>
                    <Td>{r.gravity}</Td>
                    <Td>{r.temp}</Td>
                    <Td>{r.status === 'ok' ? 'OK' : r.status === 'duplicate' ? 'Duplicate: skipped' : r.error}</Td>
                  </tr>
                ))}
              </tbody>
            </Table>
          </div>
          <Button
            size="lg"
            disabled={preview.errors > 0 || preview.toImport === 0}
            busy={commit.isPending}
            onClick={confirm}
          >
            {preview.errors > 0 ? 'Fix the rows with errors to import' : `Import ${preview.toImport} readings`}
          </Button>
        </>
      )}
    </div>
  );
}
