/** The feed as a dense table: newest first, one row per entry, retracted entries struck through with their reason. */
import Link from "next/link";
import type { FeedItem } from "@/db/entry-feed";
import { Badge } from "@/components/ui/Badge";
import { Time } from "@/components/ui/Time";
import { CategoryBadge } from "./CategoryBadge";

/** Rows of the logbook feed. */
export function FeedTable({ items }: { items: FeedItem[] }) {
  return (
    <table className="w-full text-sm">
      <thead className="text-left text-xs text-muted">
        <tr>
          <th className="py-2 pr-3 font-normal">Written (UTC)</th>
          <th className="pr-3 font-normal">Category</th>
          <th className="pr-3 font-normal">Entry</th>
          <th className="pr-3 font-normal">Runs</th>
          <th className="pr-3 font-normal">By</th>
          <th className="font-normal">State</th>
        </tr>
      </thead>
      <tbody>
        {items.map((e) => (
          <tr key={e.id} className="border-t border-line align-top" data-testid="feed-row">
            <td className="py-2 pr-3"><Time at={e.createdAt} /></td>
            <td className="py-2 pr-3"><CategoryBadge category={e.category} /></td>
            <td className="max-w-[40rem] py-2 pr-3">
              <Link href={`/logbook/${e.id}`} className={`font-medium hover:text-accent ${e.retractedAt ? "line-through decoration-bad" : ""}`}>
                {e.title}
              </Link>
              {e.retractedAt && <p className="text-xs text-bad">Retracted: {e.retractReason}</p>}
              <p className="line-clamp-2 text-xs text-muted">{e.excerpt}</p>
              {e.tags.length > 0 && (
                <p className="mt-0.5 flex flex-wrap gap-1">
                  {e.tags.map((t) => (
                    <Link key={t} href={`/logbook?tag=${encodeURIComponent(t)}`} className="rounded bg-raised px-1 text-xs text-muted hover:text-ink">#{t}</Link>
                  ))}
                </p>
              )}
            </td>
            <td className="py-2 pr-3 tabular">
              {e.runNumbers.length ? e.runNumbers.map((n) => <Link key={n} href={`/runs/${n}`} className="mr-1 text-accent hover:underline">{n}</Link>) : <span className="text-muted">—</span>}
            </td>
            <td className="py-2 pr-3 whitespace-nowrap">{e.authorName}</td>
            <td className="space-y-1 py-2">
              {e.retractedAt && <Badge tone="bad" icon="⊘">retracted</Badge>}
              {e.revision > 1 && <Badge tone="muted" icon="✎">revision {e.revision}</Badge>}
              {e.needsSafetyReview && <Badge tone="warn" icon="✚">safety review</Badge>}
              {e.attachmentCount > 0 && <Badge tone="muted" icon="⬇">{e.attachmentCount} file{e.attachmentCount === 1 ? "" : "s"}</Badge>}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
