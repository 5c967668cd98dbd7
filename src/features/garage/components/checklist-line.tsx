import { Camera, Minus, Plus, TriangleAlert } from 'lucide-react';
import { useId, useState, type ChangeEvent } from 'react';
import { toast } from 'sonner';
import {
  conditionPolicies,
  conditionPolicyLabels,
  teardownStatuses,
  teardownStatusLabels,
  type ConditionPolicy,
  type TeardownStatus,
  type TeardownUpdateInput,
} from '@shared/schemas/garage';
import { Button } from '@/components/ui/button';
import { cn } from '@/lib/cn';
import type { ChecklistLine } from '../api/garage-schemas';
import { useUpdateTeardownItem } from '../api/update-teardown-item';
import { useUploadTeardownPhotos } from '../api/upload-teardown-photos';
import { needStatuses, safetyLine, statusShortLabels, statusTone } from '../utils/garage-format';
import { SelectField } from '@/components/ui/form-field';

const ACCEPT = 'image/jpeg,image/png,image/webp';

/** One bill-of-materials line of the teardown checklist: status, usable on hand, wanted condition, note, photos. */
export function ChecklistLineItem({ vehicleId, assemblyId, line }: { vehicleId: string; assemblyId: string; line: ChecklistLine }) {
  const update = useUpdateTeardownItem();
  const upload = useUploadTeardownPhotos(vehicleId, assemblyId);
  const [note, setNote] = useState(line.teardown.note);
  const noteId = useId();
  const t = line.teardown;
  // While a change is on its way, show what was asked for rather than flicking back.
  const pending = update.isPending ? update.variables.input : {};
  const status: TeardownStatus = pending.status ?? t.status;
  const usable = pending.usableOnHand ?? t.usableOnHand;
  const policy: ConditionPolicy = pending.policy ?? t.policy;
  const inNeeds = needStatuses.includes(status);
  const title = `${line.part.primaryNumber ?? 'No number'} ${line.part.name}`;
  const caution = safetyLine[line.part.safetyClass];

  const save = (input: TeardownUpdateInput, done?: string) =>
    update.mutate(
      { vehicleId, assemblyId, bomLineId: line.id, input },
      { onSuccess: () => (done ? toast.success(done) : undefined), onError: (e) => toast.error(e.message) },
    );

  const onPhotos = (e: ChangeEvent<HTMLInputElement>) => {
    const files = [...(e.target.files ?? [])];
    e.target.value = '';
    if (!files.length) return;
    upload.mutate(
      { bomLineId: line.id, files },
      { onSuccess: (p) => toast.success(`${p.length} photo${p.length === 1 ? '' : 's'} added`), onError: (err) => toast.error(err.message) },
    );
  };

  return (
    <li
      aria-label={`Callout ${line.callout}: ${line.part.name}`}
      data-status={status}
      className={cn('rounded-card border bg-paper-raised p-4 shadow-card', inNeeds ? 'border-warn/50' : 'border-rule')}
    >
      <div className="flex flex-wrap items-baseline gap-x-3 gap-y-1">
        <span
          aria-hidden="true"
          className="inline-flex size-7 shrink-0 items-center justify-center rounded-full border-2 border-ink text-xs font-bold text-ink"
        >
          {line.callout}
        </span>
        <span className="font-mono text-sm font-semibold text-ink">{line.part.primaryNumber ?? '—'}</span>
        <h3 className="min-w-0 flex-1 text-base font-semibold text-ink">{line.part.name}</h3>
        <span className="text-sm text-ink-muted">{line.quantity} per assembly</span>
      </div>
      {line.notes ? <p className="mt-1 pl-10 text-sm text-ink-soft">{line.notes}</p> : null}
      {line.uncertain?.length ? <p className="mt-1 pl-10 text-xs text-info">Check applicability: {line.uncertain.join('; ')}</p> : null}
      {caution ? (
        <p className="mt-2 flex items-start gap-1.5 pl-10 text-xs font-medium text-warn">
          <TriangleAlert aria-hidden="true" className="mt-px size-3.5 shrink-0" />
          {caution}
        </p>
      ) : null}

      <fieldset className="mt-3 sm:pl-10" disabled={update.isPending}>
        <legend className="sr-only">Status of {title}</legend>
        <div className="flex flex-wrap gap-1.5">
          {teardownStatuses.map((s) => (
            <label
              key={s}
              className={cn(
                'inline-flex h-8 cursor-pointer items-center gap-1.5 rounded-tag border px-2.5 text-sm font-medium select-none',
                'has-focus-visible:outline-3 has-focus-visible:outline-patina-500',
                s === status ? statusTone[s].checked : 'border-rule-strong bg-paper text-ink-soft hover:bg-paper-sunk',
              )}
            >
              <input
                type="radio"
                name={`status-${line.id}`}
                value={s}
                checked={s === status}
                onChange={() => save({ status: s })}
                className="sr-only"
              />
              <span aria-hidden="true" className={cn('size-2 rounded-full', statusTone[s].dot)} />
              <span title={teardownStatusLabels[s]}>{statusShortLabels[s]}</span>
            </label>
          ))}
        </div>
      </fieldset>

      {inNeeds ? (
        <div className="mt-3 flex flex-wrap items-end gap-x-6 gap-y-3 sm:pl-10">
          <div>
            <p className="mb-1.5 text-sm font-semibold text-ink" id={`${noteId}-usable`}>
              Usable on hand
            </p>
            <div role="group" aria-labelledby={`${noteId}-usable`} className="flex items-center gap-1">
              <Button
                variant="secondary"
                size="sm"
                aria-label="One fewer usable on hand"
                disabled={usable <= 0 || update.isPending}
                onClick={() => save({ usableOnHand: usable - 1 })}
                icon={<Minus aria-hidden="true" className="size-4" />}
              />
              <output aria-live="polite" className="w-8 text-center font-mono text-base font-semibold text-ink">
                {usable}
              </output>
              <Button
                variant="secondary"
                size="sm"
                aria-label="One more usable on hand"
                disabled={usable >= line.quantity || update.isPending}
                onClick={() => save({ usableOnHand: usable + 1 })}
                icon={<Plus aria-hidden="true" className="size-4" />}
              />
            </div>
          </div>
          <p className="pb-1.5 text-sm text-ink-soft" data-testid="needed">
            <span className="font-semibold text-ink">Needed {line.needed}</span> = {line.quantity} per assembly − {t.usableOnHand} usable on hand
          </p>
          <SelectField
            label="Wanted condition"
            className="min-w-52"
            value={policy}
            disabled={update.isPending}
            onChange={(e) => save({ policy: e.target.value as ConditionPolicy })}
          >
            {conditionPolicies.map((p) => (
              <option key={p} value={p}>
                {conditionPolicyLabels[p]}
              </option>
            ))}
          </SelectField>
        </div>
      ) : null}

      <details className="group mt-3 sm:pl-10" open={t.note !== '' || t.photos.length > 0 || undefined}>
        <summary className="cursor-pointer text-sm font-medium text-patina-700 select-none">
          Note and photos{t.photos.length ? ` (${t.photos.length})` : ''}
        </summary>
        <div className="mt-2 grid gap-3 md:grid-cols-[minmax(0,1fr)_auto]">
          <div>
            <label htmlFor={noteId} className="sr-only">
              Note on {title}
            </label>
            <textarea
              id={noteId}
              rows={2}
              value={note}
              onChange={(e) => setNote(e.target.value)}
              placeholder="Condition, marks found, what was wrong…"
              className="block w-full rounded-tag border border-rule-strong bg-paper px-3 py-2 text-sm text-ink placeholder:text-ink-muted"
            />
            <Button
              variant="secondary"
              size="sm"
              className="mt-2"
              disabled={note.trim() === t.note}
              isLoading={update.isPending && pending.note !== undefined}
              onClick={() => save({ note: note.trim() }, 'Note saved')}
            >
              Save note
            </Button>
          </div>
          <div>
            {t.photos.length ? (
              <ul aria-label={`Photos of ${line.part.name}`} className="mb-2 flex flex-wrap gap-2">
                {t.photos.map((p, i) => (
                  <li key={p.id}>
                    <a href={p.urls.large} target="_blank" rel="noreferrer">
                      <img
                        src={p.urls.thumb}
                        alt={`Photo ${i + 1} of ${line.part.name}`}
                        className="size-16 rounded-tag border border-rule object-cover"
                        style={{ backgroundColor: p.placeholderColor ?? undefined }}
                      />
                    </a>
                  </li>
                ))}
              </ul>
            ) : null}
            <label className="inline-flex h-8 cursor-pointer items-center gap-2 rounded-tag border border-rule-strong bg-paper-raised px-3 text-sm font-semibold text-ink hover:bg-paper-sunk has-focus-visible:outline-3 has-focus-visible:outline-patina-500">
              <Camera aria-hidden="true" className="size-4" />
              {upload.isPending ? 'Uploading…' : 'Add photos'}
              <input type="file" accept={ACCEPT} multiple className="sr-only" onChange={onPhotos} disabled={upload.isPending} aria-label={`Add photos of ${line.part.name}`} />
            </label>
          </div>
        </div>
      </details>
    </li>
  );
}
