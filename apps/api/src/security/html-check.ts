import { parse } from 'parse5';

interface Node {
  nodeName: string;
  tagName?: string;
  value?: string;
  attrs?: Array<{ name: string; value: string }>;
  childNodes?: Node[];
  content?: Node;
}

/** Elements that run script or load active content by themselves. */
const ACTIVE_TAGS = new Set([
  'script',
  'iframe',
  'frame',
  'frameset',
  'object',
  'embed',
  'applet',
  'base',
  'link',
]);
const URL_ATTRS = new Set([
  'href',
  'src',
  'action',
  'formaction',
  'xlink:href',
  'data',
  'background',
  'poster',
  'dynsrc',
  'lowsrc',
  'codebase',
]);
const SCRIPT_URL = /^(javascript|vbscript|livescript|data:text\/html|data:image\/svg)/;

/** Drops whitespace and C0 control characters, which browsers skip inside a URL scheme. */
const squash = (v: string) =>
  [...v]
    .filter((ch) => ch.charCodeAt(0) > 0x20)
    .join('')
    .toLowerCase();

/** Every element node of an HTML document or fragment, parsed by parse5 as a browser would (WHATWG algorithm). */
function* elements(node: Node): Generator<Node> {
  if (node.tagName) yield node;
  for (const child of node.childNodes ?? []) yield* elements(child);
  if (node.content) yield* elements(node.content);
}

/**
 * Markup in `html` that a browser would execute: script-capable elements, on* event handlers, script URLs in URL
 * attributes, `meta http-equiv=refresh` and CSS expressions/script URLs in style attributes. Empty when safe.
 * Ordinary markup (div, p, a with an http(s) link, inline style) is allowed: e-mail HTML uses it.
 */
export function executableMarkup(html: string): string[] {
  const out: string[] = [];
  for (const el of elements(parse(html))) {
    const tag = el.tagName ?? '';
    if (ACTIVE_TAGS.has(tag)) out.push(`<${tag}>`);
    for (const { name, value } of el.attrs ?? []) {
      const n = name.toLowerCase();
      const v = squash(value);
      if (n.startsWith('on')) out.push(`${tag}[${n}]`);
      if (URL_ATTRS.has(n) && SCRIPT_URL.test(v)) out.push(`${tag}[${n}=${v.slice(0, 24)}]`);
      if (n === 'srcdoc') out.push(`${tag}[srcdoc]`);
      if (n === 'style' && /expression\(|javascript:|vbscript:|url\(/.test(v))
        out.push(`${tag}[style=${v.slice(0, 24)}]`);
      if (tag === 'meta' && n === 'http-equiv' && v === 'refresh') out.push('<meta refresh>');
    }
  }
  return out;
}

/** The text a browser shows for `html` (concatenated text nodes of the body). */
export function visibleText(html: string): string {
  let text = '';
  const walk = (node: Node) => {
    if (node.nodeName === '#text') text += node.value ?? '';
    for (const child of node.childNodes ?? []) walk(child);
  };
  walk(parse(html));
  return text;
}
