/**
 * Server-rendered, sanitized page HTML (see server/services/pages/page-render.ts), styled as page text.
 * A click on a statement opens its working.
 */
export function PageHtml({ html, onStatement }: { html: string; onStatement?: (statementId: string) => void }) {
  return (
    // biome-ignore lint/a11y/noStaticElementInteractions: one delegated listener for the statements inside the server's HTML
    // biome-ignore lint/a11y/useKeyWithClickEvents: the statements are spans in the server's HTML; from the keyboard each working opens from the statement list beside the page
    <div
      className="space-y-4 font-serif text-[18px] leading-relaxed [&_a]:text-accent [&_a]:underline [&_aside]:rounded-lg [&_aside]:border [&_aside]:border-changed/60 [&_aside]:bg-changed/10 [&_aside]:px-4 [&_aside]:py-3 [&_blockquote]:border-l-4 [&_blockquote]:border-rule [&_blockquote]:pl-4 [&_blockquote]:text-muted [&_figcaption]:mt-2 [&_figcaption]:font-sans [&_figcaption]:text-sm [&_h2]:text-2xl [&_h2]:font-semibold [&_h3]:text-xl [&_h3]:font-semibold [&_ol]:list-decimal [&_ol]:pl-6 [&_small]:block [&_small]:text-muted [&_ul]:list-disc [&_ul]:pl-6 [&_.statement]:cursor-pointer [&_.statement]:border-b-[1.5px] [&_.statement]:border-dotted [&_.statement]:border-accent/70 [&_.statement]:bg-accent/5"
      onClick={(e) => {
        const el = (e.target as HTMLElement).closest('[data-statement-id]');
        if (el && onStatement) onStatement(el.getAttribute('data-statement-id')!);
      }}
      // biome-ignore lint/security/noDangerouslySetInnerHtml: the HTML is produced and sanitized by the server's page renderer, never by the browser
      dangerouslySetInnerHTML={{ __html: html }}
    />
  );
}
