import Papa from 'papaparse';
import { chartColors } from './theme';

/**
 * Downloads of rendered charts: the `<svg>` as an SVG file or a PNG (drawn at 2× onto a canvas),
 * and curves as CSV text. The SVG is cleaned for use outside the app: the crosshair
 * (`data-export-exclude`) is dropped, the in-SVG legend (`data-export-only`) is revealed and the
 * canvas grown by `data-export-extra-height`, and CSS variables in inline styles are resolved.
 */

export interface CsvColumn {
  /** Header, with its unit, e.g. "sum_magnitude_db". */
  name: string;
  values: ArrayLike<number>;
}

export interface FrequencyCsvData {
  frequencyHz: ArrayLike<number>;
  columns: readonly CsvColumn[];
}

export interface FrequencyCsvOptions {
  /** Header of the first column (default "frequency_hz"). */
  frequencyHeader?: string;
  /** Significant digits written (default 6); null writes full precision. */
  significantDigits?: number | null;
}

function csvNumber(value: number | undefined, digits: number | null): string {
  if (value === undefined || !Number.isFinite(value)) return '';
  return digits === null ? String(value) : String(Number(value.toPrecision(digits)));
}

/**
 * CSV text (RFC 4180, CRLF line ends) with one row per frequency and one column per series;
 * NaN/±Infinity and missing values are written as empty cells.
 * `frequencyCsv([20, 40], [{ name: 'sum_db', values: [-0.5, 0] }])` →
 * `"frequency_hz,sum_db\r\n20,-0.5\r\n40,0"`.
 */
export function frequencyCsv(frequencyHz: ArrayLike<number>, columns: readonly CsvColumn[], options: FrequencyCsvOptions = {}): string {
  const { frequencyHeader = 'frequency_hz', significantDigits = 6 } = options;
  const names = [frequencyHeader, ...columns.map((c) => c.name)];
  if (new Set(names).size !== names.length) throw new RangeError(`frequencyCsv needs distinct column names (got ${names.join(', ')})`);
  const data: string[][] = [];
  for (let i = 0; i < frequencyHz.length; i++) {
    data.push([csvNumber(frequencyHz[i], significantDigits), ...columns.map((c) => csvNumber(c.values[i], significantDigits))]);
  }
  return Papa.unparse({ fields: names, data }, { newline: '\r\n' });
}

/** `withExtension('Blend: magnitude', 'svg')` → `"Blend-magnitude.svg"`. */
export function withExtension(filename: string, extension: string): string {
  const base = filename.trim().replace(new RegExp(`\\.${extension}$`, 'i'), '').replace(/[^\p{L}\p{N}._-]+/gu, '-').replace(/^-+|-+$/g, '') || 'chart';
  return `${base}.${extension}`;
}

/**
 * Replace `var(--name, fallback)` in CSS text with `lookup(name)`, keeping the fallback after it
 * so a downloaded file still has a generic family when the app's font is not installed.
 * `resolveCssVariables('font-family:var(--font-mono, monospace)', () => 'Plex Mono')` →
 * `"font-family:Plex Mono, monospace"`.
 */
export function resolveCssVariables(css: string, lookup: (name: string) => string): string {
  return css.replace(/var\(\s*(--[\w-]+)\s*(?:,\s*([^()]*))?\)/g, (_, name: string, fallback: string | undefined) => {
    const value = lookup(name).trim();
    if (value && fallback) return `${value}, ${fallback.trim()}`;
    return value || fallback?.trim() || 'inherit';
  });
}

/** Standalone SVG text for a rendered chart (see the module comment for what is changed). */
export function serializeSvg(svg: SVGSVGElement): string {
  const clone = svg.cloneNode(true) as SVGSVGElement;
  clone.querySelectorAll('[data-export-exclude]').forEach((node) => node.remove());
  clone.querySelectorAll('[data-export-only]').forEach((node) => node.removeAttribute('visibility'));
  const viewBox = svg.viewBox.baseVal;
  const width = viewBox && viewBox.width > 0 ? viewBox.width : svg.clientWidth;
  const height = (viewBox && viewBox.height > 0 ? viewBox.height : svg.clientHeight) + Number(svg.getAttribute('data-export-extra-height') ?? 0);
  clone.setAttribute('xmlns', 'http://www.w3.org/2000/svg');
  clone.setAttribute('width', String(width));
  clone.setAttribute('height', String(height));
  clone.setAttribute('viewBox', `0 0 ${width} ${height}`);
  clone.removeAttribute('class');
  clone.removeAttribute('tabindex');
  const computed = typeof getComputedStyle === 'function' ? getComputedStyle(svg) : null;
  const lookup = (name: string) => computed?.getPropertyValue(name) ?? '';
  [clone, ...Array.from(clone.querySelectorAll('[style]'))].forEach((node) => {
    const style = node.getAttribute('style');
    if (style) node.setAttribute('style', resolveCssVariables(style, lookup));
  });
  return `<?xml version="1.0" encoding="UTF-8"?>\n${new XMLSerializer().serializeToString(clone)}`;
}

/** Save a Blob under `filename` through a temporary link. */
export function downloadBlob(blob: Blob, filename: string): void {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = filename;
  link.rel = 'noopener';
  document.body.appendChild(link);
  link.click();
  link.remove();
  // Revoke after the click has been handled.
  setTimeout(() => URL.revokeObjectURL(url), 0);
}

export function downloadText(text: string, filename: string, mimeType: string): void {
  downloadBlob(new Blob([text], { type: `${mimeType};charset=utf-8` }), filename);
}

export function downloadSvg(svg: SVGSVGElement, filename: string): void {
  downloadText(serializeSvg(svg), withExtension(filename, 'svg'), 'image/svg+xml');
}

export function downloadCsv(csv: string, filename: string): void {
  downloadText(csv, withExtension(filename, 'csv'), 'text/csv');
}

/**
 * PNG of the chart at `scale` × its size (default 2, sharp on high-density screens and in print)
 * on a white background. Text uses the fonts the browser can give an image (usually system ones).
 */
export async function svgToPngBlob(svg: SVGSVGElement, scale = 2, background: string = chartColors.surface): Promise<Blob> {
  const text = serializeSvg(svg);
  const sizes = text.match(/<svg[^>]*\swidth="([\d.]+)"[^>]*\sheight="([\d.]+)"/);
  const width = Number(sizes?.[1] ?? svg.clientWidth);
  const height = Number(sizes?.[2] ?? svg.clientHeight);
  const url = URL.createObjectURL(new Blob([text], { type: 'image/svg+xml;charset=utf-8' }));
  try {
    const image = new Image();
    image.decoding = 'async';
    await new Promise<void>((resolve, reject) => {
      image.onload = () => resolve();
      image.onerror = () => reject(new Error('The chart could not be drawn as an image.'));
      image.src = url;
    });
    const canvas = document.createElement('canvas');
    canvas.width = Math.round(width * scale);
    canvas.height = Math.round(height * scale);
    const context = canvas.getContext('2d');
    if (!context) throw new Error('This browser cannot draw on a canvas.');
    context.fillStyle = background;
    context.fillRect(0, 0, canvas.width, canvas.height);
    context.drawImage(image, 0, 0, canvas.width, canvas.height);
    return await new Promise<Blob>((resolve, reject) => {
      canvas.toBlob((blob) => (blob ? resolve(blob) : reject(new Error('The PNG could not be made.'))), 'image/png');
    });
  } finally {
    URL.revokeObjectURL(url);
  }
}

export async function downloadPng(svg: SVGSVGElement, filename: string, scale = 2): Promise<void> {
  downloadBlob(await svgToPngBlob(svg, scale), withExtension(filename, 'png'));
}
