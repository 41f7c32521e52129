'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useForm, useWatch, type FieldPath } from 'react-hook-form';
import { parseNumberText } from '@/lib/number-input';
import { Button } from '@/components/ui/button';
import { ApiError } from '@/lib/client/api';
import { profileFieldsSchema, type ProfileFields } from '@/lib/validations/profile';
import { VoicingFields, type ProfileFormValues } from './voicing-fields';

type FormInput = ProfileFormValues;

export const EMPTY_PROFILE: ProfileFields = {
  name: '',
  kind: 'main',
  lowRolloff: { kind: 'sealed', cornerHz: 60, q: 0.71 },
  highRolloff: { kind: 'none' },
  sensitivityDb: 87,
  sensitivityReference: '2.83V',
  ratedPowerW: 100,
  impedanceOhm: 8,
  notes: '',
  voicingOptions: [],
};

interface Props {
  initial: ProfileFields;
  workspaces?: { id: string; name: string }[];
  onSubmit: (fields: ProfileFields, workspaceId?: string) => Promise<void>;
  onCancel: () => void;
  submitLabel: string;
}

const inputClass = (error?: string) => `rounded-md border bg-white px-3 py-2 text-sm ${error ? 'border-fail' : 'border-line'}`;

/** Create or edit a Speaker profile; the same zod schema checks it here and in the route handler. */
export function ProfileForm({ initial, workspaces, onSubmit, onCancel, submitLabel }: Props) {
  const {
    register,
    handleSubmit,
    control,
    setError,
    getValues,
    formState: { errors, isSubmitting },
  } = useForm<FormInput, unknown, ProfileFields>({
    resolver: zodResolver(profileFieldsSchema),
    // Checked as it is typed (a required name left empty says so at once), not only on Save.
    mode: 'onChange',
    defaultValues: { ...initial, workspaceId: workspaces?.[0]?.id },
  });
  const lowKind = useWatch({ control, name: 'lowRolloff.kind' });
  const highKind = useWatch({ control, name: 'highRolloff.kind' });
  const kind = useWatch({ control, name: 'kind' });
  const workspaceId = useWatch({ control, name: 'workspaceId' });
  const err = (path: string): string | undefined => {
    let node: unknown = errors;
    for (const part of path.split('.')) node = (node as Record<string, unknown> | undefined)?.[part];
    return (node as { message?: string } | undefined)?.message;
  };
  // Either decimal mark (80,5 is 80.5): read by the one parser of number fields; unreadable text becomes NaN, which the schema refuses with a message.
  const num = { setValueAs: (v: unknown) => (typeof v === 'number' ? v : ((r) => (r.ok ? r.value : Number.NaN))(parseNumberText(String(v), { decimalMark: '.' }))) };

  const field = (path: FieldPath<FormInput>, label: string, unit: string, opts: { step?: number; min?: number; max?: number } = {}) => {
    const id = `profile-${path.replace(/\./g, '-')}`;
    const e = err(path);
    return (
      <div className="flex flex-col gap-1">
        <label htmlFor={id} className="text-sm font-medium">
          {label} {unit ? <span className="font-normal text-ink-faint">({unit})</span> : null}
        </label>
        <input id={id} type="text" inputMode="decimal" autoComplete="off" title={opts.min !== undefined && opts.max !== undefined ? `${opts.min} to ${opts.max}${unit ? ` ${unit}` : ''}` : undefined} className={`num ${inputClass(e)}`} aria-invalid={e ? true : undefined} aria-describedby={e ? `${id}-error` : undefined} {...register(path, num)} />
        {e ? (
          <p id={`${id}-error`} role="alert" className="text-sm text-fail">
            {e}
          </p>
        ) : null}
      </div>
    );
  };

  return (
    <form
      noValidate
      className="flex flex-col gap-4"
      onSubmit={handleSubmit(async (fields) => {
        try {
          await onSubmit(fields, workspaceId);
        } catch (e) {
          if (e instanceof ApiError && e.issues.length) {
            for (const issue of e.issues) setError(issue.path as FieldPath<FormInput>, { message: issue.message });
          }
          setError('root', { message: e instanceof ApiError ? e.message : 'That did not work; nothing was changed.' });
        }
      })}
    >
      {workspaces && workspaces.length > 1 ? (
        <div className="flex flex-col gap-1">
          <label htmlFor="profile-workspace" className="text-sm font-medium">
            Workspace
          </label>
          <select id="profile-workspace" className={inputClass()} {...register('workspaceId')}>
            {workspaces.map((w) => (
              <option key={w.id} value={w.id}>
                {w.name}
              </option>
            ))}
          </select>
        </div>
      ) : null}
      <div className="grid gap-3 sm:grid-cols-[1fr_auto]">
        <div className="flex flex-col gap-1">
          <label htmlFor="profile-name" className="text-sm font-medium">
            Name
          </label>
          <input id="profile-name" maxLength={120} className={inputClass(err('name'))} aria-invalid={err('name') ? true : undefined} aria-describedby={err('name') ? 'profile-name-error' : undefined} {...register('name')} />
          {err('name') ? (
            <p id="profile-name-error" role="alert" className="text-sm text-fail">
              {err('name')}
            </p>
          ) : null}
        </div>
        <fieldset className="flex flex-col gap-1">
          <legend className="text-sm font-medium">Kind</legend>
          <div className="flex gap-3 py-2 text-sm">
            <label className="flex items-center gap-1.5">
              <input type="radio" value="main" {...register('kind')} /> Main speaker
            </label>
            <label className="flex items-center gap-1.5">
              <input type="radio" value="sub" {...register('kind')} /> Subwoofer
            </label>
          </div>
        </fieldset>
      </div>

      <fieldset className="grid gap-3 rounded-md border border-line p-3 sm:grid-cols-3">
        <legend className="px-1 text-sm font-semibold">Low-frequency roll-off</legend>
        <div className="flex flex-col gap-1">
          <label htmlFor="profile-low-kind" className="text-sm font-medium">
            Alignment
          </label>
          <select id="profile-low-kind" className={inputClass()} {...register('lowRolloff.kind')}>
            <option value="sealed">Sealed (2nd order)</option>
            <option value="vented">Vented or passive radiator (4th order)</option>
            <option value="none">None (flat)</option>
          </select>
        </div>
        {lowKind !== 'none' ? field('lowRolloff.cornerHz', 'Corner', 'Hz', { min: 5, max: 500 }) : null}
        {lowKind === 'sealed' ? field('lowRolloff.q', 'Q', '', { step: 0.01, min: 0.3, max: 3 }) : null}
      </fieldset>

      <fieldset className="grid gap-3 rounded-md border border-line p-3 sm:grid-cols-3">
        <legend className="px-1 text-sm font-semibold">Upper roll-off {kind === 'sub' ? '(the sub’s own low-pass)' : ''}</legend>
        <div className="flex flex-col gap-1">
          <label htmlFor="profile-high-kind" className="text-sm font-medium">
            Shape
          </label>
          <select id="profile-high-kind" className={inputClass()} {...register('highRolloff.kind')}>
            <option value="none">None</option>
            <option value="lowpass">2nd-order low-pass</option>
          </select>
        </div>
        {highKind === 'lowpass' ? field('highRolloff.cornerHz', 'Corner', 'Hz', { min: 30, max: 2000 }) : null}
        {highKind === 'lowpass' ? field('highRolloff.q', 'Q', '', { step: 0.01, min: 0.3, max: 3 }) : null}
      </fieldset>

      <div className="grid gap-3 sm:grid-cols-4">
        {field('sensitivityDb', 'Sensitivity', 'dB SPL', { step: 0.5, min: 60, max: 130 })}
        <div className="flex flex-col gap-1">
          <label htmlFor="profile-sens-ref" className="text-sm font-medium">
            Sensitivity at
          </label>
          <select id="profile-sens-ref" className={inputClass()} {...register('sensitivityReference')}>
            <option value="2.83V">2.83 V / 1 m</option>
            <option value="1W">1 W / 1 m</option>
          </select>
        </div>
        {field('ratedPowerW', 'Rated power', 'W', { min: 1, max: 20000 })}
        {field('impedanceOhm', 'Impedance', 'Ω', { min: 1, max: 64 })}
      </div>

      <VoicingFields control={control} register={register} getValues={getValues} err={err} num={num} />

      <div className="flex flex-col gap-1">
        <label htmlFor="profile-notes" className="text-sm font-medium">
          Notes
        </label>
        <textarea id="profile-notes" rows={3} maxLength={2000} className={inputClass(err('notes'))} {...register('notes')} />
      </div>

      {errors.root?.message ? (
        <p role="alert" className="text-sm text-fail">
          {errors.root.message}
        </p>
      ) : null}
      <div className="flex justify-end gap-2">
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
        <Button type="submit" disabled={isSubmitting}>
          {isSubmitting ? 'Saving…' : submitLabel}
        </Button>
      </div>
    </form>
  );
}
