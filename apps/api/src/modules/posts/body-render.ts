import { generateHTML } from '@tiptap/html/server';
import Image from '@tiptap/extension-image';
import StarterKit from '@tiptap/starter-kit';
import sanitizeHtml from 'sanitize-html';
import { tiptapProblem, type TiptapNode } from '@app/shared';
import { AppError } from '../../errors/app-error';

/** The same extensions the editor uses; the schema built from them rejects anything else. */
const EXTENSIONS = [
  StarterKit.configure({
    link: {
      openOnClick: false,
      autolink: true,
      protocols: ['http', 'https', 'mailto'],
      HTMLAttributes: { rel: 'noopener noreferrer nofollow', target: '_blank' },
    },
    heading: { levels: [2, 3, 4] },
  }),
  Image.configure({ inline: false }),
];

/** Image sources a post may use: our own upload paths only (no other site, no data: or script URLs). */
const isOwnImageSrc = (src: string) => /^\/uploads\/[\w\-./]+$/.test(src) && !src.includes('..');

const SANITIZE: sanitizeHtml.IOptions = {
  allowedTags: [
    'p',
    'br',
    'h2',
    'h3',
    'h4',
    'ul',
    'ol',
    'li',
    'blockquote',
    'pre',
    'code',
    'hr',
    'strong',
    'em',
    's',
    'u',
    'a',
    'img',
  ],
  allowedAttributes: {
    a: ['href', 'rel', 'target', 'title'],
    img: ['src', 'alt', 'title', 'width', 'height'],
    ol: ['start'],
    code: ['class'],
  },
  allowedClasses: { code: [/^language-[\w-]+$/] },
  allowedSchemes: ['http', 'https', 'mailto'],
  allowedSchemesByTag: { img: [] },
  allowProtocolRelative: false,
  exclusiveFilter: (frame) => frame.tag === 'img' && !isOwnImageSrc(frame.attribs.src ?? ''),
  transformTags: {
    a: sanitizeHtml.simpleTransform('a', { rel: 'noopener noreferrer nofollow', target: '_blank' }),
  },
};

/** Sanitizes HTML to the tags and attributes a post may hold (also used on pasted HTML). */
export const sanitizePostHtml = (html: string) => sanitizeHtml(html, SANITIZE);

function collectText(node: TiptapNode, out: string[]) {
  if (node.type === 'text' && node.text) out.push(node.text);
  if (node.type === 'image' && typeof node.attrs?.alt === 'string') out.push(` ${node.attrs.alt} `);
  for (const child of node.content ?? []) collectText(child, out);
  if (
    ['paragraph', 'heading', 'listItem', 'codeBlock', 'blockquote', 'hardBreak'].includes(node.type)
  )
    out.push('\n');
}

/** Plain text of a Tiptap document (for search, excerpts and edit-size checks). */
export function docText(doc: TiptapNode): string {
  const out: string[] = [];
  collectText(doc, out);
  return out
    .join('')
    .replace(/[ \t]+/g, ' ')
    .replace(/\n{3,}/g, '\n\n')
    .trim();
}

/**
 * Renders a post body (Tiptap JSON) to sanitized HTML and plain text. Throws VALIDATION_FAILED on a node or
 * mark type we do not allow, or JSON the editor schema cannot read.
 */
export function renderBody(doc: unknown): { html: string; text: string } {
  const problem = tiptapProblem(doc);
  if (problem) throw new AppError('VALIDATION_FAILED', problem, { body: problem });
  const node = doc as TiptapNode;
  let raw: string;
  try {
    raw = generateHTML(node, EXTENSIONS);
  } catch {
    throw new AppError('VALIDATION_FAILED', 'The post body could not be read', {
      body: 'The post body could not be read',
    });
  }
  return { html: sanitizePostHtml(raw), text: docText(node) };
}
