import { Download, FileUp } from 'lucide-react';
import { useState, type DragEvent } from 'react';
import { Link } from 'react-router-dom';
import { LISTING_LIMITS, type ImportMapping } from '@shared/schemas/listings';
import { Badge } from '@/components/ui/badge';
import { Button, buttonClasses } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { paths } from '@/config/paths';
import { fieldErrorsOf } from '@/lib/api-client';
import { cn } from '@/lib/cn';
import { commitImport, importTemplateHref, usePreviewImport } from '../api/import-listings';
import type { ImportPreview, ImportResult } from '../api/seller-types';
import { chunkCsv } from '../utils/csv-chunks';

const CHUNK_ROWS = 25;
type Step = 'file' | 'map' | 'check' | 'import';
const steps: Array<[Step, string]> = [
  ['file', 'Choose the file'],
  ['map', 'Match the columns'],
  ['check', 'Check the rows'],
  ['import', 'Import'],
];

interface Progress {
  done: number;
  total: number;
  result: ImportResult | null;
  error: string | null;
}

/** CSV bulk import: file, column mapping, a preview with each row's errors, then the import with progress. */
export function ImportWizard() {
  const [step, setStep] = useState<Step>('file');
  const [fileName, setFileName] = useState('');
  const [csv, setCsv] = useState('');
  const [mapping, setMapping] = useState<ImportMapping>({});
  const [preview, setPreview] = useState<ImportPreview | null>(null);
  const [as, setAs] = useState<'draft' | 'submitted'>('draft');
  const [skipInvalid, setSkipInvalid] = useState(false);
  const [progress, setProgress] = useState<Progress | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const check = usePreviewImport();

  async function readFile(file: File) {
    setProblem(null);
    if (file.size > LISTING_LIMITS.importBytesMax) return setProblem('The CSV file may be at most 2 MB; split it into smaller files.');
    const text = await file.text();
    setFileName(file.name);
    setCsv(text);
    check.mutate(
      { csv: text },
      {
        onSuccess: (p) => {
          setPreview(p);
          setMapping(p.mapping as ImportMapping);
          setStep('map');
        },
        onError: (e) => setProblem(e.message),
      },
    );
  }

  function runCheck() {
    setProblem(null);
    check.mutate(
      { csv, mapping },
      {
        onSuccess: (p) => {
          setPreview(p);
          setStep('check');
        },
        onError: (e) => {
          const fe = Object.entries(fieldErrorsOf(e)).map(([k, m]) => `${k.replace(/^mapping\./, '')}: ${m[0]}`);
          setProblem([e.message, ...fe].join(' · '));
        },
      },
    );
  }

  async function runImport() {
    setStep('import');
    const chunks = chunkCsv(csv, CHUNK_ROWS);
    const total = chunks.reduce((n, c) => n + c.rows, 0);
    const result: ImportResult = { created: 0, listingIds: [], as, skipped: [] };
    setProgress({ done: 0, total, result: null, error: null });
    let done = 0;
    for (const c of chunks) {
      try {
        const r = await commitImport({ csv: c.csv, mapping, as, skipInvalid });
        result.created += r.created;
        result.listingIds.push(...r.listingIds);
        // The server numbers rows within the chunk; give the seller their own file's row numbers.
        result.skipped.push(...r.skipped.map((s) => ({ ...s, row: s.row - 2 + c.firstRow })));
      } catch (e) {
        // A chunk of only invalid rows is refused with "No row can be imported": those rows are skipped, not fatal.
        if (skipInvalid && e instanceof Error && /No row can be imported/.test(e.message)) {
          result.skipped.push({ row: c.firstRow, errors: [{ field: 'row', message: `rows ${c.firstRow}–${c.firstRow + c.rows - 1} had errors` }] });
        } else {
          setProgress({ done, total, result, error: `${e instanceof Error ? e.message : 'The import failed'}. ${result.created} listing${result.created === 1 ? ' was' : 's were'} imported before it stopped.` });
          return;
        }
      }
      done += c.rows;
      setProgress({ done, total, result: null, error: null });
    }
    setProgress({ done: total, total, result, error: null });
  }

  const onDrop = (e: DragEvent) => {
    e.preventDefault();
    const f = e.dataTransfer.files[0];
    if (f) void readFile(f);
  };

  const invalid = preview?.summary.invalid ?? 0;
  const canImport = preview !== null && preview.summary.valid > 0 && (invalid === 0 || skipInvalid);

  return (
    <div className="space-y-6">
      <ol aria-label="Import steps" className="flex flex-wrap gap-2 text-sm">
        {steps.map(([s, label], i) => (
          <li
            key={s}
            aria-current={step === s ? 'step' : undefined}
            className={cn('rounded-tag border px-3 py-1', step === s ? 'border-patina-500 bg-patina-50 font-semibold text-ink' : 'border-rule text-ink-muted')}
          >
            {i + 1}. {label}
          </li>
        ))}
      </ol>

      {problem ? (
        <Notice tone="danger" role="alert" title="The file could not be used">
          {problem}
        </Notice>
      ) : null}

      {step === 'file' ? (
        <div className="space-y-4">
          <div onDragOver={(e) => e.preventDefault()} onDrop={onDrop} className="flex flex-col items-center gap-3 rounded-card border-2 border-dashed border-rule-strong bg-paper-raised px-4 py-10 text-center">
            <FileUp aria-hidden="true" className="size-8 text-patina-600" />
            <p className="text-ink-soft">Drop a CSV file here, or</p>
            <label className={buttonClasses('secondary', 'sm', 'cursor-pointer')}>
              Choose a CSV file
              <input type="file" accept=".csv,text/csv" className="sr-only" onChange={(e) => e.target.files?.[0] && void readFile(e.target.files[0])} />
            </label>
            <p className="text-xs text-ink-muted">
              Up to {LISTING_LIMITS.importRowsMax} rows and 2 MB. Any column names work: you match them to ours next.
            </p>
            {check.isPending ? <p className="text-sm text-ink-muted">Reading the file…</p> : null}
          </div>
          <a href={importTemplateHref} download className={buttonClasses('ghost', 'sm')}>
            <Download aria-hidden="true" className="size-4" /> Download the template (CSV with two fictional example rows)
          </a>
        </div>
      ) : null}

      {step === 'map' && preview ? (
        <section aria-label="Match the columns" className="space-y-4">
          <p className="text-ink-soft">
            <strong className="text-ink">{fileName}</strong>: {preview.summary.total} rows, columns {preview.headers.join(', ')}. We guessed the matches from the column names; check them.
          </p>
          <div className="grid gap-3 sm:grid-cols-2">
            {preview.fields.map((f) => (
              <div key={f.name}>
                <label htmlFor={`map-${f.name}`} className="mb-1 block text-sm font-semibold text-ink">
                  {f.label}
                  {f.required ? <span className="text-danger"> *</span> : null}
                </label>
                <select
                  id={`map-${f.name}`}
                  value={mapping[f.name as keyof ImportMapping] ?? ''}
                  onChange={(e) => setMapping((m) => ({ ...m, [f.name]: e.target.value || null }))}
                  className="block h-10 w-full rounded-tag border border-rule-strong bg-paper-raised px-3"
                >
                  <option value="">— not in the file —</option>
                  {preview.headers.map((h) => (
                    <option key={h} value={h}>
                      {h}
                    </option>
                  ))}
                </select>
              </div>
            ))}
          </div>
          <div className="flex gap-2">
            <Button onClick={runCheck} isLoading={check.isPending}>
              Check the rows
            </Button>
            <Button variant="ghost" onClick={() => setStep('file')}>
              Choose another file
            </Button>
          </div>
        </section>
      ) : null}

      {step === 'check' && preview ? (
        <section aria-label="Check the rows" className="space-y-4">
          <p role="status" className="text-ink">
            {preview.summary.valid} of {preview.summary.total} rows are ready; {invalid} {invalid === 1 ? 'has' : 'have'} errors.
          </p>
          <div className="max-h-[28rem] overflow-auto rounded-card border border-rule bg-paper-raised shadow-card">
            <table className="w-full border-collapse text-left text-sm">
              <caption className="sr-only">Rows of the file and their errors</caption>
              <thead className="sticky top-0 bg-paper-sunk text-label text-ink-muted uppercase">
                <tr>
                  <th scope="col" className="px-3 py-2">Row</th>
                  <th scope="col" className="px-3 py-2">Title</th>
                  <th scope="col" className="px-3 py-2">Part</th>
                  <th scope="col" className="px-3 py-2">Condition</th>
                  <th scope="col" className="px-3 py-2">Qty</th>
                  <th scope="col" className="px-3 py-2">Price</th>
                  <th scope="col" className="px-3 py-2">Check</th>
                </tr>
              </thead>
              <tbody>
                {preview.rows.map((r) => (
                  <tr key={r.row} className={cn('border-t border-rule align-top', r.errors.length ? 'bg-danger-soft/40' : '')}>
                    <td className="px-3 py-2 tabular-nums">{r.row}</td>
                    <td className="px-3 py-2 text-ink">{r.values.title}</td>
                    <td className="px-3 py-2">{r.part ? r.part.name : r.values.part_number ? <span className="font-mono">{r.values.part_number}</span> : <span className="text-ink-muted">Unidentified</span>}</td>
                    <td className="px-3 py-2">{r.values.condition}</td>
                    <td className="px-3 py-2 tabular-nums">{r.values.quantity}</td>
                    <td className="px-3 py-2 tabular-nums">{r.values.price}</td>
                    <td className="px-3 py-2">
                      {r.errors.length === 0 ? (
                        <Badge tone="ok">Ready</Badge>
                      ) : (
                        <ul className="space-y-0.5 text-danger">
                          {r.errors.map((e, i) => (
                            <li key={i}>
                              <span className="font-semibold">{e.field.replace(/_/g, ' ')}</span>: {e.message}
                            </li>
                          ))}
                        </ul>
                      )}
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          <fieldset className="space-y-2">
            <legend className="text-sm font-semibold text-ink">Import as</legend>
            <label className="flex items-center gap-2 text-sm">
              <input type="radio" name="as" checked={as === 'draft'} onChange={() => setAs('draft')} className="size-4 accent-patina-600" />
              Drafts: add photos first, submit later
            </label>
            <label className="flex items-center gap-2 text-sm">
              <input type="radio" name="as" checked={as === 'submitted'} onChange={() => setAs('submitted')} className="size-4 accent-patina-600" />
              Submitted for review now
            </label>
          </fieldset>
          {invalid > 0 ? (
            <label className="flex items-center gap-2 text-sm text-ink">
              <input type="checkbox" checked={skipInvalid} onChange={(e) => setSkipInvalid(e.target.checked)} className="size-4 accent-patina-600" />
              Import the {preview.summary.valid} ready rows and skip the {invalid} with errors
            </label>
          ) : null}
          <div className="flex gap-2">
            <Button onClick={() => void runImport()} disabled={!canImport}>
              Import {invalid > 0 && skipInvalid ? preview.summary.valid : preview.summary.total} listings
            </Button>
            <Button variant="ghost" onClick={() => setStep('map')}>
              Back to the columns
            </Button>
          </div>
        </section>
      ) : null}

      {step === 'import' && progress ? (
        <section aria-label="Import" className="space-y-4">
          <div>
            <p className="mb-1 text-sm text-ink-soft">
              {progress.done} of {progress.total} rows processed
            </p>
            <div
              role="progressbar"
              aria-label="Import progress"
              aria-valuemin={0}
              aria-valuemax={progress.total}
              aria-valuenow={progress.done}
              className="h-2.5 overflow-hidden rounded-full bg-paper-sunk"
            >
              <div className="h-full bg-patina-500 transition-[width]" style={{ width: `${progress.total ? (progress.done / progress.total) * 100 : 0}%` }} />
            </div>
          </div>
          {progress.error ? (
            <Notice tone="danger" role="alert" title="The import stopped">
              {progress.error}
            </Notice>
          ) : null}
          {progress.result ? (
            <Notice tone="ok" role="status" title={`${progress.result.created} listing${progress.result.created === 1 ? '' : 's'} imported as ${progress.result.as === 'draft' ? 'drafts' : 'submitted for review'}`}>
              {progress.result.skipped.length ? <p>Skipped rows: {progress.result.skipped.map((s) => s.row).join(', ')}.</p> : null}
              <Link to={paths.seller.getHref()} className={buttonClasses('secondary', 'sm', 'mt-2')}>
                Go to the seller desk
              </Link>
            </Notice>
          ) : null}
        </section>
      ) : null}
    </div>
  );
}
