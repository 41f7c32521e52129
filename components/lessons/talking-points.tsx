import { createElement, Fragment, type ReactNode } from 'react';

/**
 * Talking points: plain text with a small Markdown subset, rendered to React elements (never to
 * an HTML string, so anything that looks like markup stays text):
 * - a blank line starts a new paragraph; a single line break stays a line break;
 * - lines starting with "- " (or "* ") make a bulleted list;
 * - **bold** and *italic* inside a line (unclosed markers stay as they are).
 */
export function renderPoints(text: string): ReactNode[] {
  const blocks: ReactNode[] = [];
  const lines = text.replace(/\r\n?/g, '\n').split('\n');
  let paragraph: string[] = [];
  let bullets: string[] = [];
  const flushParagraph = () => {
    if (!paragraph.length) return;
    const parts: ReactNode[] = [];
    paragraph.forEach((line, i) => {
      if (i > 0) parts.push(createElement('br', { key: `br${i}` }));
      parts.push(createElement(Fragment, { key: `l${i}` }, ...renderInline(line)));
    });
    blocks.push(createElement('p', { key: `p${blocks.length}` }, ...parts));
    paragraph = [];
  };
  const flushBullets = () => {
    if (!bullets.length) return;
    blocks.push(
      createElement(
        'ul',
        { key: `u${blocks.length}`, className: 'list-disc pl-[1.2em]' },
        ...bullets.map((b, i) => createElement('li', { key: i }, ...renderInline(b))),
      ),
    );
    bullets = [];
  };
  for (const raw of lines) {
    const line = raw.trimEnd();
    const bullet = /^\s*[-*]\s+(.*)$/.exec(line);
    if (!line.trim()) {
      flushParagraph();
      flushBullets();
    } else if (bullet) {
      flushParagraph();
      bullets.push(bullet[1] ?? '');
    } else {
      flushBullets();
      paragraph.push(line.trim());
    }
  }
  flushParagraph();
  flushBullets();
  return blocks;
}

/** **bold** and *italic* (bold may hold italic); everything else is literal text. */
export function renderInline(text: string): ReactNode[] {
  const out: ReactNode[] = [];
  let buffer = '';
  let i = 0;
  const flush = () => {
    if (buffer) out.push(buffer);
    buffer = '';
  };
  while (i < text.length) {
    if (text.startsWith('**', i)) {
      const end = text.indexOf('**', i + 2);
      if (end > i + 2) {
        flush();
        out.push(createElement('strong', { key: `b${i}` }, ...renderInline(text.slice(i + 2, end))));
        i = end + 2;
        continue;
      }
    } else if (text[i] === '*' && text[i + 1] !== undefined && text[i + 1] !== ' ') {
      const end = text.indexOf('*', i + 1);
      if (end > i + 1 && text[end - 1] !== ' ') {
        flush();
        out.push(createElement('em', { key: `i${i}` }, text.slice(i + 1, end)));
        i = end + 1;
        continue;
      }
    }
    buffer += text[i];
    i++;
  }
  flush();
  return out;
}

/** The rendered talking points; `className` sets the type size (the Presenter view makes it large). */
export function TalkingPoints({ text, className = '' }: { text: string; className?: string }) {
  const blocks = renderPoints(text);
  if (!blocks.length) return <p className={`text-ink-faint ${className}`}>No talking points.</p>;
  return <div className={`flex flex-col gap-[0.6em] ${className}`}>{blocks}</div>;
}
