/** Typography for a rendered post body (Tailwind resets headings and lists). */
export const POST_BODY_CLASSES =
  'flex flex-col gap-3 text-ink-900 [&_a]:underline [&_blockquote]:border-l-4 [&_blockquote]:border-sand-500 [&_blockquote]:pl-3 [&_blockquote]:italic [&_code]:rounded-sm [&_code]:bg-sand-200 [&_code]:px-1 [&_h2]:text-xl [&_h3]:text-lg [&_h4]:font-bold [&_img]:max-w-full [&_img]:rounded-md [&_ol]:list-decimal [&_ol]:pl-6 [&_pre]:overflow-x-auto [&_pre]:rounded-md [&_pre]:bg-sand-200 [&_pre]:p-2 [&_ul]:list-disc [&_ul]:pl-6';
