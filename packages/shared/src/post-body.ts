import { z } from 'zod';

// What a post body (Tiptap JSON) may hold, and the schema that checks it.

/** Largest post body, in characters of plain text, and of its stored JSON. */
export const MAX_POST_TEXT_CHARS = 40_000;
export const MAX_POST_JSON_CHARS = 150_000;

/** Node types a post body may hold, with the attributes each may carry. */
export const ALLOWED_NODES: Readonly<Record<string, readonly string[]>> = {
  doc: [],
  paragraph: [],
  text: [],
  heading: ['level'],
  bulletList: [],
  orderedList: ['start', 'type'],
  listItem: [],
  blockquote: [],
  codeBlock: ['language'],
  hardBreak: [],
  horizontalRule: [],
  image: ['src', 'alt', 'title', 'width', 'height'],
};
/** Mark types a post body may hold, with their attributes. */
export const ALLOWED_MARKS: Readonly<Record<string, readonly string[]>> = {
  bold: [],
  italic: [],
  strike: [],
  underline: [],
  code: [],
  link: ['href', 'target', 'rel', 'class', 'title'],
};

/** One node of Tiptap (ProseMirror) JSON. */
export interface TiptapNode {
  type: string;
  attrs?: Record<string, unknown>;
  content?: TiptapNode[];
  marks?: Array<{ type: string; attrs?: Record<string, unknown> }>;
  text?: string;
}

const MAX_DEPTH = 12;

/**
 * Walks a Tiptap document and returns the first problem (unknown node or mark type, unknown attribute,
 * too deep), or null when every part is one we allow.
 */
export function tiptapProblem(doc: unknown): string | null {
  const walk = (node: unknown, depth: number): string | null => {
    if (depth > MAX_DEPTH) return 'The post is nested too deeply';
    if (typeof node !== 'object' || node === null || Array.isArray(node))
      return 'The post body is not a document';
    const n = node as Record<string, unknown>;
    const type = n.type;
    if (typeof type !== 'string') return 'Every part of the post needs a type';
    const attrsAllowed = ALLOWED_NODES[type];
    if (!Object.hasOwn(ALLOWED_NODES, type) || !attrsAllowed)
      return `Unknown node type "${type.slice(0, 40)}"`;
    if (depth === 0 && type !== 'doc') return 'The post body must be a document';
    for (const key of Object.keys(n))
      if (!['type', 'attrs', 'content', 'marks', 'text'].includes(key))
        return `Unknown key "${key.slice(0, 40)}" in ${type}`;
    const attrProblem = checkAttrs(n.attrs, attrsAllowed, type);
    if (attrProblem) return attrProblem;
    if (n.text !== undefined && (type !== 'text' || typeof n.text !== 'string'))
      return 'Text must be a string inside a text node';
    if (n.marks !== undefined) {
      if (!Array.isArray(n.marks)) return 'Marks must be a list';
      for (const mark of n.marks as unknown[]) {
        const m = (typeof mark === 'object' && mark !== null ? mark : {}) as Record<
          string,
          unknown
        >;
        const markType = typeof m.type === 'string' ? m.type : '';
        const markAttrs = ALLOWED_MARKS[markType];
        if (!Object.hasOwn(ALLOWED_MARKS, markType) || !markAttrs)
          return `Unknown mark type "${markType.slice(0, 40)}"`;
        const p = checkAttrs(m.attrs, markAttrs, markType);
        if (p) return p;
      }
    }
    if (n.content !== undefined) {
      if (!Array.isArray(n.content)) return 'Content must be a list';
      for (const child of n.content as unknown[]) {
        const p = walk(child, depth + 1);
        if (p) return p;
      }
    }
    return null;
  };
  return walk(doc, 0);
}

function checkAttrs(attrs: unknown, allowed: readonly string[], type: string): string | null {
  if (attrs === undefined || attrs === null) return null;
  if (typeof attrs !== 'object' || Array.isArray(attrs)) return `Bad attributes on ${type}`;
  for (const [key, value] of Object.entries(attrs)) {
    if (!allowed.includes(key)) return `Unknown attribute "${key.slice(0, 40)}" on ${type}`;
    if (value !== null && !['string', 'number', 'boolean'].includes(typeof value))
      return `Bad value for ${key} on ${type}`;
  }
  return null;
}

/** A Tiptap document made only of the nodes and marks we allow, under the size cap. */
export const tiptapDocSchema = z.unknown().superRefine((doc, ctx) => {
  const problem = tiptapProblem(doc);
  if (problem) {
    ctx.addIssue({ code: 'custom', message: problem });
    return;
  }
  if (JSON.stringify(doc).length > MAX_POST_JSON_CHARS)
    ctx.addIssue({
      code: 'custom',
      message: `The post is too long: keep it under about ${MAX_POST_TEXT_CHARS.toLocaleString('en')} characters`,
    });
});
