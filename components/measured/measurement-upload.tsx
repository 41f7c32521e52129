'use client';

import { useId, useState } from 'react';
import { useDropzone, type FileRejection } from 'react-dropzone';
import { FrequencyPlot, formatHzReadout as formatHz, traceStyles } from '@/components/charts';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/client/api';
import { uploadMeasurement, type UploadAnswer } from '@/lib/hooks/use-measurements';
import { MAX_MEASUREMENT_BYTES, type ParsedMeasurement } from '@/lib/measurements/parse-measurement';
import type { WindowChoice } from './impulse-plot-data';
import { ImpulseWindowEditor } from './impulse-window-editor';
import { MeasurementFields, type MeasurementLabels } from './measurement-fields';
import { MAX_WAV_BYTES } from '@/lib/measurements/read-wav';
import { readMeasurementFile, type FileStage } from './read-measurement-file';
import { windowedResponse } from './windowed-response-preview';

export interface LocalCurve {
  /** `local:<n>`: kept in this page only. */
  id: string;
  name: string;
  seat: string | null;
  role: string | null;
  runLabel?: string | null;
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

type Stage = { kind: 'empty' } | FileStage;

/** "Skipped 3 lines of text before line 4 (notes or a header, not numbers); the data start on line 4." */
const skippedNote = (count: number, firstDataLine: number) =>
  `Skipped ${count} line${count === 1 ? '' : 's'} of text before line ${firstDataLine} (notes or a header, not numbers); the data start on line ${firstDataLine}.`;

const baseName = (fileName: string) => fileName.replace(/\.[A-Za-z0-9]{1,5}$/, '').slice(0, 120) || 'Measurement';
const guessRole = (fileName: string) => (/sub|lfe/i.test(fileName) ? 'sub' : /sum|both|together/i.test(fileName) ? 'sum' : 'mains');
/** A window field as the form sends it: ms with six decimals at most. */
const msField = (v: number) => String(Number(v.toFixed(6)));

/** What a save answered, in words (an impulse response with its arrival and window). */
function savedWords(a: UploadAnswer): string {
  const head = `Saved "${a.name}"${a.runLabel ? ` (${a.runLabel})` : ''}: ${a.pointCount} points.`;
  if (a.sourceFormat !== 'wav') return `${head}${a.skippedLines && a.firstDataLine !== undefined ? ` ${skippedNote(a.skippedLines, a.firstDataLine)}` : ''}`;
  const arrival = a.arrivalMs === null ? '' : ` The peak arrives ${a.arrivalMs.toFixed(2)} ms after the file's first sample.`;
  const w = a.impulseWindow;
  return `${head}${arrival}${w ? ` Window: ${w.startMs.toFixed(2)}–${(w.startMs + w.lengthMs).toFixed(2)} ms.` : ''}`;
}

/** Drop or pick a measurement: a text file (parsed here first, with the server's parser) or a WAV impulse response (windowed here), previewed, then uploaded with progress. */
export function MeasurementUpload({ systemId, canSave, saveBlockedReason, seatNames, onSaved, onUseLocally }: Props) {
  const id = useId();
  const [stage, setStage] = useState<Stage>({ kind: 'empty' });
  const [labels, setLabels] = useState<MeasurementLabels>({ name: '', seat: seatNames[0] ?? '', role: 'mains', runLabel: '' });
  const [win, setWin] = useState<WindowChoice | null>(null);
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
        setStage({ kind: 'refused', fileName: r.file.name, message: tooBig ? `The file is larger than ${MAX_WAV_BYTES / 1024 / 1024} MB (${(r.file.size / 1024 / 1024).toFixed(1)} MB).` : r.errors[0]?.message ?? 'That file cannot be used.', issues: [], totalIssues: 0 });
      }
      return;
    }
    const next = await readMeasurementFile(file);
    setStage(next);
    if (next.kind === 'refused') return;
    setWin(next.kind === 'wav' ? next.loaded.defaults : null);
    setLabels((l) => ({ ...l, name: baseName(file.name), role: guessRole(file.name) }));
  };

  const { getRootProps, getInputProps, isDragActive, open } = useDropzone({ onDrop, multiple: false, maxSize: MAX_WAV_BYTES, noClick: true, noKeyboard: true });

  const ready = stage.kind === 'preview' || stage.kind === 'wav';
  const name = (file: File) => labels.name.trim() || baseName(file.name);
  const runLabel = labels.runLabel.trim();

  async function save() {
    if (stage.kind !== 'preview' && stage.kind !== 'wav') return;
    setSaveError(null);
    setProgress(0);
    const form = new FormData();
    form.set('file', stage.file, stage.file.name);
    form.set('name', name(stage.file));
    if (labels.seat) form.set('seat', labels.seat);
    form.set('role', labels.role);
    if (runLabel) form.set('runLabel', runLabel);
    if (systemId) form.set('systemId', systemId);
    if (stage.kind === 'wav' && win) {
      form.set('windowStartMs', msField(win.startMs));
      form.set('windowLengthMs', msField(win.lengthMs));
    }
    try {
      const answer = await uploadMeasurement(form, setProgress);
      setSavedNote(savedWords(answer));
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
    if (stage.kind !== 'preview' && stage.kind !== 'wav') return;
    let points: Pick<LocalCurve, 'frequencyHz' | 'magnitudeDb' | 'phaseDeg'>;
    if (stage.kind === 'wav') {
      const result = windowedResponse(stage.loaded.wav, win ?? stage.loaded.defaults);
      if (!result.ok) {
        setSaveError(result.message);
        return;
      }
      points = { frequencyHz: Array.from(result.curve.frequencyHz), magnitudeDb: Array.from(result.curve.magnitudeDb), phaseDeg: Array.from(result.curve.phaseDeg) };
    } else points = { frequencyHz: stage.parsed.frequencyHz, magnitudeDb: stage.parsed.magnitudeDb, phaseDeg: stage.parsed.phaseDeg };
    onUseLocally({ name: name(stage.file), seat: labels.seat || null, role: labels.role, runLabel: runLabel || null, ...points });
    setSavedNote(`"${name(stage.file)}" is in the list for this page only (not saved).`);
    setStage({ kind: 'empty' });
  }

  return (
    <section aria-labelledby={`${id}-title`} className="flex min-w-0 flex-col gap-3 rounded-lg border border-line bg-white p-3">
      <h3 id={`${id}-title`} className="text-sm font-semibold">
        Add a measurement
      </h3>
      <div
        {...getRootProps({
          className: `flex flex-col items-center justify-center gap-2 rounded-md border-2 border-dashed px-3 py-4 text-center text-sm ${isDragActive ? 'border-mains bg-tint-info' : 'border-line bg-paper'}`,
        })}
        data-testid="measurement-dropzone"
      >
        <input {...getInputProps({ 'aria-label': 'Measurement file' })} data-testid="measurement-file-input" />
        <p className="text-ink-soft">{isDragActive ? 'Drop the file here' : 'Drop a measurement file here, or'}</p>
        <Button variant="secondary" onClick={open}>
          Choose a file…
        </Button>
        <p className="max-w-2xl text-xs text-ink-faint">
          Text or CSV, up to {MAX_MEASUREMENT_BYTES / 1024 / 1024} MB: frequency (Hz), magnitude (dB) and, if you have it, phase (°) per line. Or an impulse response as a WAV file, up to{' '}
          {MAX_WAV_BYTES / 1024 / 1024} MB: 16-, 24- or 32-bit integer or 32-bit float, 8–192 kHz, at most 10 s (the first channel is read).
        </p>
      </div>

      {savedNote ? (
        <Notice kind="ok">
          <span data-testid="measurement-saved-note">{savedNote}</span>
        </Notice>
      ) : null}

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

      {ready ? (
        <div className="flex min-w-0 flex-col gap-3" data-testid={stage.kind === 'wav' ? 'wav-preview' : 'measurement-preview'}>
          {stage.kind === 'preview' ? <TextFilePreview fileName={stage.file.name} parsed={stage.parsed} /> : null}
          {stage.kind === 'wav' && win ? <ImpulseWindowEditor fileName={stage.file.name} loaded={stage.loaded} window={win} onWindow={setWin} /> : null}
          <MeasurementFields labels={labels} onChange={setLabels} seatNames={seatNames} />
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
              Use on this page only
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

/** What a text file holds: its points, range, phase and skipped lines, and its magnitude. */
function TextFilePreview({ fileName, parsed }: { fileName: string; parsed: ParsedMeasurement }) {
  return (
    <>
      <p className="text-sm">
        <span className="font-medium">{fileName}</span>: <span className="num" data-testid="preview-point-count">{parsed.pointCount}</span> points,{' '}
        <span className="num">
          {formatHz(parsed.startHz)} – {formatHz(parsed.stopHz)}
        </span>
        , {parsed.hasPhase ? 'with phase' : 'no phase (it will be estimated as minimum phase)'}
        {parsed.decimalComma ? ', decimal commas' : ''}.
      </p>
      {parsed.skippedLines ? (
        <p className="text-xs text-ink-soft" data-testid="preview-skipped-lines">
          {skippedNote(parsed.skippedLines, parsed.firstDataLine)}
        </p>
      ) : null}
      <FrequencyPlot
        title="Preview of the file's magnitude"
        quantity="magnitude"
        frequencyHz={parsed.frequencyHz}
        minHz={Math.max(1, Math.min(10, parsed.startHz))}
        maxHz={Math.min(20000, Math.max(1000, parsed.stopHz))}
        traces={[{ id: 'preview', label: 'Magnitude', values: parsed.magnitudeDb, ...traceStyles.mains }]}
        heightPx={170}
        showLegend={false}
      />
    </>
  );
}
