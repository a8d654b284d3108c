import Image from '@tiptap/extension-image';
import { EditorContent, useEditor, type Editor, type JSONContent } from '@tiptap/react';
import StarterKit from '@tiptap/starter-kit';
import { useRef, useState, type ReactNode } from 'react';
import { createPortal } from 'react-dom';
import { usePromptDialog } from '@/components/ui/prompt-dialog';
import { cn } from '@/lib/cn';
import { uploadImage } from '../api/save-post';
import { linkProblem } from './link-address';
import { POST_BODY_CLASSES } from './post-body-classes';

/** The editor's extensions; the server allows exactly these nodes and marks. */
const EXTENSIONS = [
  StarterKit.configure({
    heading: { levels: [2, 3, 4] },
    link: { openOnClick: false, autolink: true, protocols: ['http', 'https', 'mailto'] },
  }),
  Image,
];

function Tool({
  label,
  active,
  onClick,
  children,
}: {
  label: string;
  active?: boolean;
  onClick: () => void;
  children: ReactNode;
}) {
  return (
    <button
      type="button"
      aria-label={label}
      aria-pressed={active}
      title={label}
      onMouseDown={(e) => e.preventDefault()}
      onClick={onClick}
      className={cn(
        'min-h-9 min-w-9 rounded-md px-2 text-sm font-bold',
        active ? 'bg-ink-800 text-sand-50' : 'bg-sand-50 text-ink-900 hover:bg-sand-200',
      )}
    >
      {children}
    </button>
  );
}

function Toolbar({
  editor,
  onImage,
  askLink,
}: {
  editor: Editor;
  onImage: () => void;
  askLink: (previous: string | undefined) => Promise<string | null>;
}) {
  const chain = () => editor.chain().focus();
  const handleLink = async () => {
    const href = await askLink(editor.getAttributes('link').href as string | undefined);
    if (href === null) return;
    if (href === '') chain().extendMarkRange('link').unsetLink().run();
    else chain().extendMarkRange('link').setLink({ href }).run();
  };
  return (
    <div
      role="toolbar"
      aria-label="Formatting"
      className="flex flex-wrap gap-1 border-b border-sand-500 p-1"
    >
      <Tool
        label="Bold"
        active={editor.isActive('bold')}
        onClick={() => chain().toggleBold().run()}
      >
        B
      </Tool>
      <Tool
        label="Italic"
        active={editor.isActive('italic')}
        onClick={() => chain().toggleItalic().run()}
      >
        <em>I</em>
      </Tool>
      <Tool
        label="Heading"
        active={editor.isActive('heading', { level: 2 })}
        onClick={() => chain().toggleHeading({ level: 2 }).run()}
      >
        H2
      </Tool>
      <Tool
        label="Subheading"
        active={editor.isActive('heading', { level: 3 })}
        onClick={() => chain().toggleHeading({ level: 3 }).run()}
      >
        H3
      </Tool>
      <Tool
        label="Bulleted list"
        active={editor.isActive('bulletList')}
        onClick={() => chain().toggleBulletList().run()}
      >
        • List
      </Tool>
      <Tool
        label="Numbered list"
        active={editor.isActive('orderedList')}
        onClick={() => chain().toggleOrderedList().run()}
      >
        1. List
      </Tool>
      <Tool
        label="Quote"
        active={editor.isActive('blockquote')}
        onClick={() => chain().toggleBlockquote().run()}
      >
        “ ”
      </Tool>
      <Tool
        label="Code"
        active={editor.isActive('codeBlock')}
        onClick={() => chain().toggleCodeBlock().run()}
      >
        {'</>'}
      </Tool>
      <Tool label="Link" active={editor.isActive('link')} onClick={() => void handleLink()}>
        Link
      </Tool>
      <Tool label="Insert image" onClick={onImage}>
        Image
      </Tool>
    </div>
  );
}

export interface RichTextEditorProps {
  initial: JSONContent | null;
  onChange: (doc: JSONContent) => void;
  labelId: string;
}

/** The post body editor (Tiptap): headings, lists, quotes, code, links and uploaded images. */
export function RichTextEditor({ initial, onChange, labelId }: RichTextEditorProps) {
  const fileRef = useRef<HTMLInputElement>(null);
  const [imageError, setImageError] = useState<string | null>(null);
  const { ask, dialog } = usePromptDialog();
  const askLink = (previous: string | undefined) =>
    ask({
      title: previous ? 'Change the link' : 'Add a link',
      label: 'Link address',
      hint: 'https://… or mailto:… Leave it empty to remove the link.',
      initial: previous ?? 'https://',
      minLength: 0,
      maxLength: 2000,
      singleLine: true,
      confirmLabel: 'Save link',
      validate: linkProblem,
    });
  const editor = useEditor({
    extensions: EXTENSIONS,
    content: initial ?? '',
    immediatelyRender: true,
    editorProps: {
      attributes: {
        'aria-labelledby': labelId,
        role: 'textbox',
        'aria-multiline': 'true',
        class: `min-h-48 p-3 focus:outline-none ${POST_BODY_CLASSES}`,
      },
    },
    onUpdate: ({ editor: e }) => onChange(e.getJSON()),
  });
  const handleFile = async (file: File | undefined) => {
    if (!file || !editor) return;
    setImageError(null);
    try {
      const img = await uploadImage(file);
      editor
        .chain()
        .focus()
        .setImage({ src: img.url, alt: file.name.replace(/\.[^.]+$/, '') })
        .run();
    } catch (err) {
      setImageError(err instanceof Error ? err.message : 'The image could not be uploaded');
    }
  };
  if (!editor) return null;
  return (
    <div className="rounded-md border border-sand-500 bg-white">
      <Toolbar editor={editor} onImage={() => fileRef.current?.click()} askLink={askLink} />
      <EditorContent editor={editor} />
      <input
        ref={fileRef}
        type="file"
        accept="image/jpeg,image/png,image/webp"
        className="sr-only"
        aria-label="Image file"
        onChange={(e) => void handleFile(e.target.files?.[0])}
      />
      {imageError && (
        <p role="alert" className="p-2 text-sm font-bold text-flare-700">
          {imageError}
        </p>
      )}
      {/* The editor sits inside the post form; a nested <form> would submit the post, so portal out. */}
      {createPortal(dialog, document.body)}
    </div>
  );
}
