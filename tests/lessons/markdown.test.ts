/** The talking-points renderer: a small Markdown subset to React elements, never to raw HTML. */
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { renderInline, renderPoints, TalkingPoints } from '@/components/lessons/talking-points';

const html = (text: string) => renderToStaticMarkup(createElement('div', null, ...renderPoints(text)));

describe('renderPoints (talking points)', () => {
  it('a <script> tag shows as text, escaped, and makes no element', () => {
    const out = html('Try <script>alert("x")</script> and <img src=x onerror=alert(1)>');
    expect(out).toBe('<div><p>Try &lt;script&gt;alert(&quot;x&quot;)&lt;/script&gt; and &lt;img src=x onerror=alert(1)&gt;</p></div>');
    expect(out).not.toContain('<script');
    expect(out).not.toContain('<img');
  });

  it('markup inside bold and bullets stays text too', () => {
    const out = html('- **<b>x</b>**\n- *<i onclick="y">z</i>*');
    expect(out).toBe('<div><ul class="list-disc pl-[1.2em]"><li><strong>&lt;b&gt;x&lt;/b&gt;</strong></li><li><em>&lt;i onclick=&quot;y&quot;&gt;z&lt;/i&gt;</em></li></ul></div>');
  });

  it('"- " lines make one bulleted list; a blank line starts a new paragraph; a single break stays a <br>', () => {
    const out = html('Intro line one\nline two\n\n- first\n- second\n\nAfter');
    expect(out).toBe('<div><p>Intro line one<br/>line two</p><ul class="list-disc pl-[1.2em]"><li>first</li><li>second</li></ul><p>After</p></div>');
  });

  it('**bold**, *italic* and bold holding italic', () => {
    expect(html('a **b** c *d* e **f *g* h**')).toBe('<div><p>a <strong>b</strong> c <em>d</em> e <strong>f <em>g</em> h</strong></p></div>');
  });

  it('unclosed or spaced markers are literal: "2 * 3", "**open", "a * b *"', () => {
    expect(html('2 * 3 = 6')).toBe('<div><p>2 * 3 = 6</p></div>');
    expect(html('**open')).toBe('<div><p>**open</p></div>');
    expect(html('a *b * c')).toBe('<div><p>a *b * c</p></div>');
  });

  it('Windows line breaks and trailing spaces do not change the result', () => {
    expect(html('- one  \r\n- two\r\n')).toBe(html('- one\n- two'));
  });

  it('renderInline returns plain strings for text without markers', () => {
    expect(renderInline('just text')).toEqual(['just text']);
  });

  it('TalkingPoints says so when there are none', () => {
    expect(renderToStaticMarkup(createElement(TalkingPoints, { text: '  \n ' }))).toContain('No talking points.');
  });
});
