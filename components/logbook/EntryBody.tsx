/**
 * An entry's markdown, rendered safely: GitHub-flavoured markdown (tables, checklists), raw HTML never rendered,
 * the HTML sanitised (rehype-sanitize's default, GitHub-like schema), unsafe link targets (javascript: and the like)
 * neutralised, and pictures shown only when they are this logbook's own attachments.
 */
import ReactMarkdown, { defaultUrlTransform, type Components } from "react-markdown";
import remarkGfm from "remark-gfm";
import rehypeSanitize from "rehype-sanitize";

const OWN_ATTACHMENT = /^\/api\/attachments\/\d+$/;

const components: Components = {
  a({ href, children }) {
    if (!href) {
      return <span title="link removed: not a safe address" className="underline decoration-dotted">{children}</span>;
    }
    const external = /^https?:/i.test(href);
    return (
      <a href={href} rel="noopener noreferrer nofollow" {...(external ? { target: "_blank" } : {})}>
        {children}
      </a>
    );
  },
  img({ src, alt }) {
    if (typeof src === "string" && OWN_ATTACHMENT.test(src)) {
      // A plain <img>: the address redirects to a presigned URL, which an image optimiser could not fetch.
      return <img src={src} alt={alt ?? ""} loading="lazy" className="max-h-[32rem]" />;
    }
    // Pictures from elsewhere are not loaded (they could track readers); the address stays visible.
    return <span className="text-muted">[picture not shown: {alt || "no description"}{typeof src === "string" && src ? ` — ${src}` : ""}]</span>;
  },
};

/** The rendered body of one revision. */
export function EntryBody({ markdown }: { markdown: string }) {
  if (!markdown.trim()) return <p className="text-sm text-muted">(no text)</p>;
  return (
    <div className="prose-entry">
      <ReactMarkdown remarkPlugins={[remarkGfm]} rehypePlugins={[rehypeSanitize]} urlTransform={defaultUrlTransform} skipHtml components={components}>
        {markdown}
      </ReactMarkdown>
    </div>
  );
}
