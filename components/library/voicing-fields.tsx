'use client';

import { useFieldArray, useWatch, type Control, type FieldPath, type UseFormGetValues, type UseFormRegister } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '@/components/ui/button';
import type { EqFilterInput } from '@/lib/validations/eq-filter';
import type { profileFieldsSchema, ProfileFields } from '@/lib/validations/profile';
import { filterOfKind, filterWithWidth, newEqFilter, newVoicingPosition, newVoicingSwitch, shelfWidth, VOICING_FORM_LIMITS } from './voicing-form';

/** The profile form's values (what the inputs hold before the schema reads them). */
export type ProfileFormValues = z.input<typeof profileFieldsSchema> & { workspaceId?: string };

interface Shared {
  control: Control<ProfileFormValues, unknown, ProfileFields>;
  register: UseFormRegister<ProfileFormValues>;
  getValues: UseFormGetValues<ProfileFormValues>;
  /** The message of the field at a dotted path, if any. */
  err: (path: string) => string | undefined;
  /** register() options of a number field (either decimal mark). */
  num: { setValueAs: (v: unknown) => unknown };
}

const input = (error?: string) => `rounded-md border bg-white px-2 py-1.5 text-sm ${error ? 'border-fail' : 'border-line'}`;
const P = (path: string) => path as FieldPath<ProfileFormValues>;

function Message({ id, text }: { id: string; text: string | undefined }) {
  return text ? (
    <p id={id} role="alert" className="text-xs text-fail">
      {text}
    </p>
  ) : null;
}

/** A labelled text input of the voicing editor, with its message. */
function TextInput({ shared, path, label, numeric }: { shared: Shared; path: string; label: string; numeric?: boolean }) {
  const id = `profile-${path.replace(/\./g, '-')}`;
  const e = shared.err(path);
  return (
    <div className="flex min-w-0 flex-col gap-1">
      <label htmlFor={id} className="text-xs font-medium text-ink-soft">
        {label}
      </label>
      <input id={id} type="text" inputMode={numeric ? 'decimal' : undefined} autoComplete="off" className={`${numeric ? 'num ' : ''}${input(e)}`} aria-invalid={e ? true : undefined} aria-describedby={e ? `${id}-error` : undefined} {...shared.register(P(path), numeric ? shared.num : undefined)} />
      <Message id={`${id}-error`} text={e} />
    </div>
  );
}

/** One EQ filter of a position: kind, frequency, gain, and Q (or, for a shelf, slope or Q). */
function FilterRow({ shared, base, onReplace, onRemove }: { shared: Shared; base: string; onReplace: (f: EqFilterInput) => void; onRemove: () => void }) {
  const filter = useWatch({ control: shared.control, name: P(base) }) as EqFilterInput | undefined;
  if (!filter) return null;
  const shelf = filter.kind !== 'peaking';
  const width = shelfWidth(filter);
  const current = () => shared.getValues(P(base)) as EqFilterInput;
  return (
    <div className="grid grid-cols-2 items-end gap-2 rounded-md border border-line p-2 sm:grid-cols-[1fr_1fr_1fr_1fr_auto]" data-testid="voicing-filter">
      <label className="flex flex-col gap-1 text-xs font-medium text-ink-soft">
        Filter
        <select className={input()} value={filter.kind} onChange={(e) => onReplace(filterOfKind(current(), e.target.value as EqFilterInput['kind']))}>
          <option value="low-shelf">Low shelf</option>
          <option value="high-shelf">High shelf</option>
          <option value="peaking">Peaking</option>
        </select>
      </label>
      <TextInput shared={shared} path={`${base}.${shelf ? 'cornerHz' : 'centerHz'}`} label={shelf ? 'Corner (Hz)' : 'Centre (Hz)'} numeric />
      <TextInput shared={shared} path={`${base}.gainDb`} label="Gain (dB)" numeric />
      {shelf ? (
        <div className="flex min-w-0 flex-col gap-1">
          <select aria-label="Shelf width given as" className={`${input()} py-0.5 text-xs`} value={width} onChange={(e) => onReplace(filterWithWidth(current(), e.target.value as 'q' | 'slope'))}>
            <option value="slope">Slope</option>
            <option value="q">Q</option>
          </select>
          <TextInput shared={shared} path={`${base}.${width}`} label={width === 'q' ? 'Q' : 'Slope (0.1–1)'} numeric />
        </div>
      ) : (
        <TextInput shared={shared} path={`${base}.q`} label="Q" numeric />
      )}
      <Button variant="ghost" className="px-2 py-1 text-fail" onClick={onRemove} aria-label="Remove this filter">
        Remove
      </Button>
    </div>
  );
}

/** One position of a switch: its name and up to four filters (none = flat). */
function PositionFields({ shared, base, first, canRemove, onRemove }: { shared: Shared; base: string; first: boolean; canRemove: boolean; onRemove: () => void }) {
  const filters = useFieldArray({ control: shared.control, name: P(`${base}.filters`) as `voicingOptions.${number}.positions.${number}.filters`, keyName: 'fieldKey' });
  return (
    <div className="flex flex-col gap-2 rounded-md bg-paper p-2" data-testid="voicing-position">
      <div className="flex items-end gap-2">
        <TextInput shared={shared} path={`${base}.name`} label={first ? 'Position name (the one a speaker starts in)' : 'Position name'} />
        {canRemove ? (
          <Button variant="ghost" className="px-2 py-1 text-fail" onClick={onRemove}>
            Remove position
          </Button>
        ) : null}
      </div>
      {filters.fields.length === 0 ? <p className="text-xs text-ink-faint">No filters: the speaker plays flat in this position.</p> : null}
      {filters.fields.map((f, k) => (
        <FilterRow key={f.fieldKey} shared={shared} base={`${base}.filters.${k}`} onReplace={(next) => filters.update(k, next)} onRemove={() => filters.remove(k)} />
      ))}
      {filters.fields.length < VOICING_FORM_LIMITS.filters ? (
        <Button variant="secondary" className="self-start px-2 py-1 text-xs" onClick={() => filters.append(newEqFilter())}>
          Add a filter
        </Button>
      ) : null}
    </div>
  );
}

/** One switch: its name and its 2–6 positions. */
function SwitchFields({ shared, index, onRemove }: { shared: Shared; index: number; onRemove: () => void }) {
  const base = `voicingOptions.${index}`;
  const positions = useFieldArray({ control: shared.control, name: `voicingOptions.${index}.positions`, keyName: 'fieldKey' });
  const positionsError = shared.err(`${base}.positions`) ?? shared.err(`${base}.positions.root`);
  return (
    <fieldset className="flex flex-col gap-2 rounded-md border border-line p-3" data-testid="voicing-switch">
      <legend className="px-1 text-sm font-medium">Switch {index + 1}</legend>
      <div className="flex items-end gap-2">
        <TextInput shared={shared} path={`${base}.name`} label="Switch name (e.g. Treble)" />
        <Button variant="ghost" className="px-2 py-1 text-fail" onClick={onRemove}>
          Remove switch
        </Button>
      </div>
      {positions.fields.map((p, j) => (
        <PositionFields key={p.fieldKey} shared={shared} base={`${base}.positions.${j}`} first={j === 0} canRemove={positions.fields.length > VOICING_FORM_LIMITS.minPositions} onRemove={() => positions.remove(j)} />
      ))}
      <Message id={`profile-voicing-${index}-positions-error`} text={positionsError} />
      {positions.fields.length < VOICING_FORM_LIMITS.maxPositions ? (
        <Button
          variant="secondary"
          className="self-start px-2 py-1 text-xs"
          onClick={() => positions.append(newVoicingPosition((shared.getValues(`voicingOptions.${index}.positions`) ?? []).map((x) => x.id)))}
        >
          Add a position
        </Button>
      ) : null}
    </fieldset>
  );
}

/**
 * Voicing options of a Speaker profile: the switches on its back panel, each with named positions and the EQ filters
 * (Audio EQ Cookbook shelves and peaking filters) the speaker runs in each. A System picks a position per speaker.
 */
export function VoicingFields(shared: Shared) {
  const switches = useFieldArray({ control: shared.control, name: 'voicingOptions', keyName: 'fieldKey' });
  return (
    <fieldset className="flex flex-col gap-3 rounded-md border border-line p-3" data-testid="voicing-options">
      <legend className="px-1 text-sm font-semibold">Voicing options</legend>
      <p className="text-xs text-ink-soft">
        The switches on the speaker&apos;s back panel (a treble shelf, a near-wall bass cut…). The first position of each is the one a speaker starts in, so keep it the
        flat or usual one. Boosts cost amplifier and driver headroom: check Headroom after choosing one.
      </p>
      {switches.fields.map((f, i) => (
        <SwitchFields key={f.fieldKey} shared={shared} index={i} onRemove={() => switches.remove(i)} />
      ))}
      {switches.fields.length < VOICING_FORM_LIMITS.switches ? (
        <Button variant="secondary" className="self-start px-2.5 py-1.5 text-sm" onClick={() => switches.append(newVoicingSwitch((shared.getValues('voicingOptions') ?? []).map((x) => x.id)))}>
          Add a switch
        </Button>
      ) : null}
    </fieldset>
  );
}
