import { JSDOM } from 'jsdom';

const BAD_TAGS = [
  'script',
  'style',
  'iframe',
  'frame',
  'frameset',
  'object',
  'embed',
  'svg',
  'base',
  'meta',
  'link',
  'body',
  'input',
  'bgsound',
  'table',
  'div',
];

/** Problems that would let `html` run script when inserted into a page: event handlers, script URLs, bad tags. */
export function scriptVectors(html: string): string[] {
  const doc = new JSDOM(`<!doctype html><html><head></head><body>${html}</body></html>`).window
    .document;
  const out: string[] = [];
  for (const el of [doc.body, ...Array.from(doc.querySelectorAll('head *, body *'))]) {
    const tag = el.tagName.toLowerCase();
    if (el !== doc.body && BAD_TAGS.includes(tag)) out.push(`<${tag}>`);
    for (const attr of Array.from(el.attributes)) {
      const name = attr.name.toLowerCase();
      const value = attr.value.replace(/[\s\0]/g, '').toLowerCase();
      if (name.startsWith('on')) out.push(`${tag}[${name}]`);
      if (name === 'style') out.push(`${tag}[style]`);
      if (/^(javascript|vbscript|data|livescript):/.test(value))
        out.push(`${tag}[${name}=${value.slice(0, 20)}]`);
      if (['src', 'href'].includes(name) && value.startsWith('//'))
        out.push(`${tag}[${name}] protocol-relative`);
    }
  }
  return out;
}
