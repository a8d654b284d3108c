import { describe, expect, it } from 'vitest';
import { excerptOf } from '@app/shared';
import { renderBody, sanitizePostHtml } from './body-render';
import { editRatio } from './edit-size';
import {
  OWASP_URL_PAYLOADS,
  OWASP_XSS_FILTER_EVASION_PAYLOADS,
} from './testing/owasp-xss-payloads';
import { scriptVectors } from './testing/html-safety';

const doc = (...content: object[]) => ({ type: 'doc', content });
const para = (text: string, marks?: object[]) => ({
  type: 'paragraph',
  content: [{ type: 'text', text, ...(marks ? { marks } : {}) }],
});

describe('scriptVectors (the checker itself)', () => {
  it('finds handlers, script URLs and script tags in raw payloads', () => {
    expect(scriptVectors('<img src=x onerror="alert(1)">')).toContain('img[onerror]');
    expect(scriptVectors('<a href="javascript:alert(1)">x</a>').length).toBe(1);
    expect(scriptVectors('<script>alert(1)</script>')).toContain('<script>');
    expect(scriptVectors("<BODY ONLOAD=alert('XSS')>")).toContain('body[onload]');
    expect(scriptVectors('<p><strong>fine</strong></p>')).toEqual([]);
  });
});

// OWASP XSS Filter Evasion Cheat Sheet payload list (fixture: testing/owasp-xss-payloads.ts)
describe('renderBody and sanitizePostHtml against the OWASP XSS Filter Evasion Cheat Sheet', () => {
  it('has a real payload list to test with', () => {
    expect(OWASP_XSS_FILTER_EVASION_PAYLOADS.length).toBeGreaterThan(40);
    // most raw payloads are dangerous as they stand, so the checks below mean something
    const dangerous = OWASP_XSS_FILTER_EVASION_PAYLOADS.filter((p) => scriptVectors(p).length > 0);
    expect(dangerous.length).toBeGreaterThan(30);
  });

  it.each(OWASP_XSS_FILTER_EVASION_PAYLOADS)('neutralises as editor text: %s', (payload) => {
    const { html, text } = renderBody(
      doc(para(payload), {
        type: 'heading',
        attrs: { level: 2 },
        content: [{ type: 'text', text: payload }],
      }),
    );
    expect(scriptVectors(html)).toEqual([]);
    expect(text).toContain(payload.trim().slice(0, 10).replace(/\s+/g, ' ').slice(0, 3));
  });

  it.each(OWASP_XSS_FILTER_EVASION_PAYLOADS)('neutralises as pasted HTML: %s', (payload) => {
    expect(scriptVectors(sanitizePostHtml(payload))).toEqual([]);
  });

  it.each(OWASP_URL_PAYLOADS)('drops a script URL in a link or image attribute: %s', (url) => {
    const { html } = renderBody(
      doc(para('rode', [{ type: 'link', attrs: { href: url } }]), {
        type: 'image',
        attrs: { src: url, alt: url, title: url },
      }),
    );
    expect(scriptVectors(html)).toEqual([]);
    expect(html).not.toMatch(/<img/);
  });

  it('keeps the formatting we allow', () => {
    const { html } = renderBody(
      doc(
        { type: 'heading', attrs: { level: 2 }, content: [{ type: 'text', text: 'Snubber' }] },
        para('chain', [{ type: 'bold' }]),
        para('site', [{ type: 'link', attrs: { href: 'https://example.org/a' } }]),
        {
          type: 'bulletList',
          content: [{ type: 'listItem', content: [para('one')] }],
        },
        { type: 'image', attrs: { src: '/uploads/images/2026/12/a.webp', alt: 'bow roller' } },
      ),
    );
    expect(html).toContain('<h2>Snubber</h2>');
    expect(html).toContain('<strong>chain</strong>');
    expect(html).toContain('href="https://example.org/a"');
    expect(html).toContain('rel="noopener noreferrer nofollow"');
    expect(html).toContain('<ul><li><p>one</p></li></ul>');
    expect(html).toContain('<img src="/uploads/images/2026/12/a.webp" alt="bow roller"');
  });

  it.each([
    [{ type: 'doc', content: [{ type: 'iframe' }] }, /Unknown node type "iframe"/],
    [
      { type: 'doc', content: [{ type: 'paragraph', attrs: { onclick: 'x' } }] },
      /Unknown attribute "onclick"/,
    ],
    [doc(para('x', [{ type: 'script' }])), /Unknown mark type "script"/],
    [{ type: 'paragraph' }, /must be a document/],
    ['<p>hi</p>', /not a document/],
  ])('rejects %j', (body, message) => {
    expect(() => renderBody(body)).toThrow(message);
  });
});

describe('editRatio', () => {
  it.each([
    ['the chain held in forty knots', 'the chain held in forty knots', 0],
    ['a b c d e f g h i j', 'a b c d e f g h i j k', 1 / 11],
    ['a b c d e', 'v w x y z', 1],
    ['', '', 0],
  ])('%s → %s is %f', (a, b, expected) => {
    expect(editRatio(a, b)).toBeCloseTo(expected, 6);
  });
});

describe('excerpts from a rendered body', () => {
  const heading = (text: string) => ({
    type: 'heading',
    attrs: { level: 2 },
    content: [{ type: 'text', text }],
  });
  const list = (...items: string[]) => ({
    type: 'bulletList',
    content: items.map((t) => ({ type: 'listItem', content: [para(t)] })),
  });

  it('keeps a heading, the paragraph under it and list items apart', () => {
    const { text } = renderBody(
      doc(
        heading('What changed'),
        para('Seven metres of chain came off the locker.'),
        heading('Kit'),
        list('Snubber', 'Chain hook'),
        para('Check the shackle wire before the season.'),
      ),
    );
    expect(excerptOf(text)).toBe(
      'What changed — Seven metres of chain came off the locker. Kit — Snubber — Chain hook — Check the shackle wire before the season.',
    );
  });

  it('keeps two paragraphs as two sentences, and a post summary uses the same excerpt', () => {
    const { text } = renderBody(doc(para('First line.'), para('Second line')));
    expect(excerptOf(text)).toBe('First line. Second line');
    const long = renderBody(doc(heading('Heading'), para('word '.repeat(80)))).text;
    const out = excerptOf(long);
    expect(out.startsWith('Heading — word')).toBe(true);
    expect(out.endsWith('…')).toBe(true);
    expect(out.length).toBeLessThanOrEqual(221);
  });
});
