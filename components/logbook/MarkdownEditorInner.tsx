"use client";
/**
 * The rich-text editor itself (MDXEditor, browser only: loaded through MarkdownEditor.tsx with ssr:false).
 * It edits markdown: headings, lists and checklists, quotes, bold/italic, links, tables, code blocks, images.
 */
import "@mdxeditor/editor/style.css";
import { useEffect, useState, type Ref } from "react";
import {
  BlockTypeSelect,
  BoldItalicUnderlineToggles,
  codeBlockPlugin,
  CreateLink,
  headingsPlugin,
  imagePlugin,
  InsertCodeBlock,
  InsertImage,
  InsertTable,
  linkDialogPlugin,
  linkPlugin,
  listsPlugin,
  ListsToggle,
  markdownShortcutPlugin,
  MDXEditor,
  quotePlugin,
  Separator,
  tablePlugin,
  thematicBreakPlugin,
  toolbarPlugin,
  UndoRedo,
  useCodeBlockEditorContext,
  type CodeBlockEditorProps,
  type MDXEditorMethods,
} from "@mdxeditor/editor";

export type MarkdownEditorProps = {
  markdown: string;
  onChange: (markdown: string) => void;
  editorRef?: Ref<MDXEditorMethods>;
  /** Uploads a picture chosen in the image dialog and returns its URL; absent before the entry is first saved. */
  uploadImage?: (file: File) => Promise<string>;
  labelId?: string;
};

/** Code blocks are edited as plain text: fast, and the logbook needs no syntax colouring. */
function PlainCodeEditor({ code }: CodeBlockEditorProps) {
  const ctx = useCodeBlockEditorContext();
  return (
    <textarea
      aria-label="Code block"
      className="block w-full rounded bg-raised p-2 font-mono text-sm"
      rows={Math.min(Math.max(code.split("\n").length, 2), 20)}
      defaultValue={code}
      onChange={(e) => ctx.setCode(e.target.value)}
      onKeyDown={(e) => e.stopPropagation()}
      spellCheck={false}
    />
  );
}

/** The MDXEditor with the logbook's plugins and a small toolbar. */
export default function MarkdownEditorInner({ markdown, onChange, editorRef, uploadImage, labelId }: MarkdownEditorProps) {
  const [dark, setDark] = useState(true);
  useEffect(() => {
    // Follow the app's night/day theme, also when it is switched while the editor is open.
    const root = document.documentElement;
    const read = () => setDark(root.dataset.theme !== "day");
    read();
    const watch = new MutationObserver(read);
    watch.observe(root, { attributes: true, attributeFilter: ["data-theme"] });
    return () => watch.disconnect();
  }, []);
  return (
    <div aria-labelledby={labelId} role="group" className="rounded border border-line bg-panel">
      <MDXEditor
        ref={editorRef}
        markdown={markdown}
        onChange={(md, initialNormalize) => {
          if (!initialNormalize) onChange(md);
        }}
        className={dark ? "dark-theme" : ""}
        contentEditableClassName="prose-entry min-h-[14rem] px-3 py-2 text-ink"
        placeholder="What happened, what you did, what the next shift should know…"
        plugins={[
          headingsPlugin(),
          listsPlugin(),
          quotePlugin(),
          thematicBreakPlugin(),
          linkPlugin(),
          linkDialogPlugin(),
          tablePlugin(),
          codeBlockPlugin({
            defaultCodeBlockLanguage: "",
            codeBlockEditorDescriptors: [{ priority: 0, match: () => true, Editor: PlainCodeEditor }],
          }),
          imagePlugin({ imageUploadHandler: uploadImage, disableImageResize: true }),
          markdownShortcutPlugin(),
          toolbarPlugin({
            toolbarContents: () => (
              <>
                <UndoRedo />
                <Separator />
                <BlockTypeSelect />
                <BoldItalicUnderlineToggles options={["Bold", "Italic"]} />
                <Separator />
                <ListsToggle />
                <CreateLink />
                <InsertTable />
                <InsertCodeBlock />
                <InsertImage />
              </>
            ),
          }),
        ]}
      />
    </div>
  );
}
