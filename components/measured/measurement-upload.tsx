'use client';

import { useId, useState } from 'react';
import { useDropzone, type FileRejection } from 'react-dropzone';
import { FrequencyPlot, formatHzReadout as formatHz, traceStyles } from '@/components/charts';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/client/api';
import { uploadMeasurement, type UploadAnswer } from '@/lib/hooks/use-measurements';
import { MAX_MEASUREMENT_BYTES, parseMeasurementBytes, type ParsedMeasurement } from '@/lib/measurements/parse-measurement';

export interface LocalCurve {
  /** `local:<n>`: kept in this page only. */
  id: string;
  name: string;
  seat: string | null;
  role: string | null;
  frequencyHz: number[];
  magnitudeDb: number[];
  phaseDeg: number[] | null;
}

interface Props {
  /** Where a save goes (the saved System's workspace); null for the caller's personal workspace. */
  systemId: string | null;
  canSave: boolean;
  /** Why saving is off, shown beside the buttons. */
  saveBlockedReason?: string;
  seatNames: string[];
  onSaved: (answer: UploadAnswer) => void;
  onUseLocally: (curve: Omit<LocalCurve, 'id'>) => void;
}

type Stage =
  | { kind: 'empty' }
  | { kind: 'refused'; fileName: string; message: string; issues: { path: string; message: string }[]; totalIssues: number }
  | { kind: 'preview'; file: File; parsed: ParsedMeasurement };

const ROLES = [
  { value: 'mains', label: 'Mains' },
  { value: 'sub', label: 'Sub' },
  { value: 'sum', label: 'Mains + sub together' },
];

/** "Skipped 3 lines of text before line 4 (notes or a header, not numbers); the data start on line 4." */
const skippedNote = (count: number, firstDataLine: number) =>
  `Skipped ${count} line${count === 1 ? '' : 's'} of text before line ${firstDataLine} (notes or a header, not numbers); the data start on line ${firstDataLine}.`;

const baseName = (fileName: string) => fileName.replace(/\.[A-Za-z0-9]{1,5}$/, '').slice(0, 120) || 'Measurement';
const guessRole = (fileName: string) => (/sub|lfe/i.test(fileName) ? 'sub' : /sum|both|together/i.test(fileName) ? 'sum' : 'mains');

/** Drop or pick a measurement file; it is parsed here first (the same parser as the server), previewed, then uploaded with progress. */
export function MeasurementUpload({ systemId, canSave, saveBlockedReason, seatNames, onSaved, onUseLocally }: Props) {
  const id = useId();
  const [stage, setStage] = useState<Stage>({ kind: 'empty' });
  const [name, setName] = useState('');
  const [seat, setSeat] = useState(seatNames[0] ?? '');
  const [role, setRole] = useState('mains');
  const [progress, setProgress] = useState<number | null>(null);
  const [saveError, setSaveError] = useState<string | null>(null);
  const [savedNote, setSavedNote] = useState<string | null>(null);

  const onDrop = async (accepted: File[], rejected: FileRejection[]) => {
    setSaveError(null);
    setSavedNote(null);
    const file = accepted[0];
    if (!file) {
      const r = rejected[0];
      if (r) {
        const tooBig = r.errors.some((e) => e.code === 'file-too-large');
        setStage({ kind: 'refused', fileName: r.file.name, message: tooBig ? `The file is larger than 2 MB (${(r.file.size / 1024 / 1024).toFixed(1)} MB).` : r.errors[0]?.message ?? 'That file cannot be used.', issues: [], totalIssues: 0 });
      }
      return;
    }
    const result = parseMeasurementBytes(new Uint8Array(await file.arrayBuffer()));
    if (!result.ok) {
      setStage({ kind: 'refused', fileName: file.name, message: result.message, issues: result.issues, totalIssues: result.totalIssues });
      return;
    }
    setStage({ kind: 'preview', file, parsed: result.measurement });
    setName(baseName(file.name));
    setRole(guessRole(file.name));
  };

  const { getRootProps, getInputProps, isDragActive, open } = useDropzone({ onDrop, multiple: false, maxSize: MAX_MEASUREMENT_BYTES, noClick: true, noKeyboard: true });

  async function save() {
    if (stage.kind !== 'preview') return;
    setSaveError(null);
    setProgress(0);
    const form = new FormData();
    form.set('file', stage.file, stage.file.name);
    form.set('name', name.trim() || baseName(stage.file.name));
    if (seat) form.set('seat', seat);
    form.set('role', role);
    if (systemId) form.set('systemId', systemId);
    try {
      const answer = await uploadMeasurement(form, setProgress);
      setSavedNote(`Saved "${answer.name}": ${answer.pointCount} points.${answer.skippedLines ? ` ${skippedNote(answer.skippedLines, answer.firstDataLine)}` : ''}`);
      setStage({ kind: 'empty' });
      onSaved(answer);
    } catch (e) {
      if (e instanceof ApiError && e.issues.length && e.status === 400) {
        setStage({ kind: 'refused', fileName: stage.file.name, message: e.message, issues: e.issues, totalIssues: Number(e.body.totalIssues ?? e.issues.length) });
      } else setSaveError(e instanceof ApiError ? e.message : 'The upload failed; nothing was saved.');
    } finally {
      setProgress(null);
    }
  }

  function useLocally() {
    if (stage.kind !== 'preview') return;
    const p = stage.parsed;
    onUseLocally({ name: name.trim() || baseName(stage.file.name), seat: seat || null, role, frequencyHz: p.frequencyHz, magnitudeDb: p.magnitudeDb, phaseDeg: p.phaseDeg });
    setSavedNote(`"${name.trim() || baseName(stage.file.name)}" is in the list for this page only (not saved).`);
    setStage({ kind: 'empty' });
  }

  return (
    <section aria-labelledby={`${id}-title`} className="flex flex-col gap-3 rounded-lg border border-line bg-white p-3">
      <h3 id={`${id}-title`} className="text-sm font-semibold">
        Add a measurement
      </h3>
      <div
        {...getRootProps({
          className: `flex flex-col items-center justify-center gap-2 rounded-md border-2 border-dashed px-3 py-5 text-center text-sm ${isDragActive ? 'border-mains bg-tint-info' : 'border-line bg-paper'}`,
        })}
        data-testid="measurement-dropzone"
      >
        <input {...getInputProps({ 'aria-label': 'Measurement file' })} data-testid="measurement-file-input" />
        <p className="text-ink-soft">{isDragActive ? 'Drop the file here' : 'Drop a measurement file here, or'}</p>
        <Button variant="secondary" onClick={open}>
          Choose a file…
        </Button>
        <p className="text-xs text-ink-faint">Text or CSV, up to 2 MB: frequency (Hz), magnitude (dB) and, if you have it, phase (°) per line.</p>
      </div>

      {savedNote ? <Notice kind="ok">{savedNote}</Notice> : null}

      {stage.kind === 'refused' ? (
        <div role="alert" data-testid="measurement-errors" className="rounded-md border border-tint-edge-fail bg-tint-fail px-3 py-2 text-sm text-tint-ink-fail">
          <p className="font-semibold">
            {stage.fileName}: {stage.message}
          </p>
          {stage.issues.length ? (
            <ul className="mt-1 max-h-48 list-disc overflow-auto pl-5">
              {stage.issues.map((i, k) => (
                <li key={k}>
                  <span className="num font-medium">{i.path}</span>: {i.message}
                </li>
              ))}
            </ul>
          ) : null}
          {stage.totalIssues > stage.issues.length ? <p className="mt-1">…and {stage.totalIssues - stage.issues.length} more.</p> : null}
          <p className="mt-1 text-xs">Nothing was saved. Fix the file and drop it again.</p>
        </div>
      ) : null}

      {stage.kind === 'preview' ? (
        <div className="flex flex-col gap-3" data-testid="measurement-preview">
          <p className="text-sm">
            <span className="font-medium">{stage.file.name}</span>: <span className="num" data-testid="preview-point-count">{stage.parsed.pointCount}</span> points,{' '}
            <span className="num">
              {formatHz(stage.parsed.startHz)} – {formatHz(stage.parsed.stopHz)}
            </span>
            , {stage.parsed.hasPhase ? 'with phase' : 'no phase (it will be estimated as minimum phase)'}
            {stage.parsed.decimalComma ? ', decimal commas' : ''}.
          </p>
          {stage.parsed.skippedLines ? (
            <p className="text-xs text-ink-soft" data-testid="preview-skipped-lines">
              {skippedNote(stage.parsed.skippedLines, stage.parsed.firstDataLine)}
            </p>
          ) : null}
          <FrequencyPlot
            title="Preview of the file's magnitude"
            quantity="magnitude"
            frequencyHz={stage.parsed.frequencyHz}
            minHz={Math.max(1, Math.min(10, stage.parsed.startHz))}
            maxHz={Math.min(20000, Math.max(1000, stage.parsed.stopHz))}
            traces={[{ id: 'preview', label: 'Magnitude', values: stage.parsed.magnitudeDb, ...traceStyles.mains }]}
            heightPx={170}
            showLegend={false}
          />
          <div className="grid gap-3 sm:grid-cols-3">
            <label className="flex flex-col gap-1 text-sm font-medium">
              Name
              <input value={name} maxLength={120} onChange={(e) => setName(e.target.value)} className="rounded-md border border-line px-3 py-2 font-normal" />
            </label>
            <label className="flex flex-col gap-1 text-sm font-medium">
              Seat
              <select value={seat} onChange={(e) => setSeat(e.target.value)} className="rounded-md border border-line bg-white px-3 py-2 font-normal">
                {seatNames.map((s) => (
                  <option key={s} value={s}>
                    {s}
                  </option>
                ))}
                <option value="">(no seat)</option>
              </select>
            </label>
            <label className="flex flex-col gap-1 text-sm font-medium">
              What was playing
              <select value={role} onChange={(e) => setRole(e.target.value)} className="rounded-md border border-line bg-white px-3 py-2 font-normal">
                {ROLES.map((r) => (
                  <option key={r.value} value={r.value}>
                    {r.label}
                  </option>
                ))}
              </select>
            </label>
          </div>
          {progress !== null ? (
            <div className="flex items-center gap-2 text-sm">
              <label htmlFor={`${id}-progress`}>Uploading</label>
              <progress id={`${id}-progress`} max={1} value={progress} className="h-2 flex-1 accent-mains" data-testid="upload-progress" />
              <span className="num">{Math.round(progress * 100)} %</span>
            </div>
          ) : null}
          {saveError ? <Notice kind="error">{saveError}</Notice> : null}
          <div className="flex flex-wrap items-center gap-2">
            <Button onClick={save} disabled={!canSave || progress !== null}>
              Save to the Library
            </Button>
            <Button variant="secondary" onClick={useLocally} disabled={progress !== null}>
              Use without saving
            </Button>
            <Button variant="ghost" onClick={() => setStage({ kind: 'empty' })} disabled={progress !== null}>
              Discard
            </Button>
            {!canSave && saveBlockedReason ? <span className="text-xs text-ink-faint">{saveBlockedReason}</span> : null}
          </div>
        </div>
      ) : null}
    </section>
  );
}
