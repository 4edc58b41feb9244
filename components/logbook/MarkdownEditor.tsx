"use client";
/** Loads the rich-text editor in the browser only (MDXEditor cannot render on the server). */
import dynamic from "next/dynamic";
import type { MarkdownEditorProps } from "./MarkdownEditorInner";

export type { MarkdownEditorProps };

/** The markdown editor, with a visible placeholder while its code loads. */
export const MarkdownEditor = dynamic<MarkdownEditorProps>(() => import("./MarkdownEditorInner"), {
  ssr: false,
  loading: () => (
    <div role="status" className="flex min-h-[16rem] items-center justify-center rounded border border-line bg-panel text-sm text-muted">
      <span aria-hidden className="mr-2 animate-pulse">✎</span>Loading the editor…
    </div>
  ),
});
