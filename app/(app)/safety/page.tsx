import Link from "next/link";
import { redirect } from "next/navigation";
import { listQueue, queueCounts } from "@/db/safety";
import { ENTRY_CATEGORIES, type EntryCategory } from "@/db/schema";
import { requireUser } from "@/lib/auth/guards";
import { rolesAllow } from "@/lib/auth/permissions";
import { EmptyState } from "@/components/ui/EmptyState";
import { Time } from "@/components/ui/Time";
import { formatAge } from "@/components/safety/age";
import { ReviewStateBadge } from "@/components/safety/ReviewStateBadge";
import { isReviewState, OPEN_STATES, REVIEW_STATE_DISPLAY, REVIEW_STATES, type ReviewState } from "@/components/safety/review-flow";

export const metadata = { title: "Safety review queue" };
export const dynamic = "force-dynamic";

const categoryWords = (c: string) => c.replace(/_/g, " ");

export default async function SafetyQueuePage({ searchParams }: { searchParams: Promise<{ state?: string; category?: string }> }) {
  // Those who do not work the queue land on the part of the safety area they may use.
  const user = await requireUser();
  if (!rolesAllow(user.roles, "safety.review")) redirect("/safety/sources");
  const sp = await searchParams;
  const stateFilter = sp.state === "all" || isReviewState(sp.state) ? sp.state : "open";
  const category = (ENTRY_CATEGORIES as readonly string[]).includes(sp.category ?? "") ? (sp.category as EntryCategory) : undefined;
  const states: readonly ReviewState[] | undefined = stateFilter === "all" ? undefined : stateFilter === "open" ? OPEN_STATES : [stateFilter as ReviewState];
  const [items, counts] = await Promise.all([listQueue({ ...(states ? { states } : {}), ...(category ? { category } : {}) }), queueCounts()]);
  const now = Date.now();

  return (
    <div>
      <h1 className="mb-1 text-xl font-semibold">Safety review queue</h1>
      <p className="mb-3 text-sm text-muted">
        Every cryogenics, radiation and incident entry, and every entry marked &ldquo;needs safety review&rdquo;, oldest first. A new revision of a reviewed entry puts it back to &ldquo;Awaiting review&rdquo;.
      </p>
      <ul aria-label="Items by state" className="mb-4 flex flex-wrap gap-2">
        {REVIEW_STATES.map((s) => (
          <li key={s}>
            <Link href={`/safety?state=${s}`} className="flex items-center gap-2 rounded border border-line bg-panel px-3 py-1.5 text-sm hover:border-accent" data-testid={`count-${s}`}>
              <ReviewStateBadge state={s} />
              <span className="tabular font-semibold">{counts[s]}</span>
            </Link>
          </li>
        ))}
      </ul>
      <form method="get" className="mb-4 flex flex-wrap items-end gap-3" aria-label="Filter the queue">
        <label className="block text-sm">
          <span className="text-xs text-muted">State</span>
          <select name="state" defaultValue={stateFilter} className="mt-1 block rounded border border-line bg-raised px-2 py-1.5">
            <option value="open">Open (awaiting review or follow-up)</option>
            <option value="all">All states</option>
            {REVIEW_STATES.map((s) => <option key={s} value={s}>{REVIEW_STATE_DISPLAY[s].label}</option>)}
          </select>
        </label>
        <label className="block text-sm">
          <span className="text-xs text-muted">Category</span>
          <select name="category" defaultValue={category ?? ""} className="mt-1 block rounded border border-line bg-raised px-2 py-1.5">
            <option value="">All categories</option>
            {ENTRY_CATEGORIES.map((c) => <option key={c} value={c}>{categoryWords(c)}</option>)}
          </select>
        </label>
        <button type="submit" className="rounded border border-line px-3 py-1.5 text-sm hover:bg-raised">Show</button>
      </form>
      {items.length === 0 ? (
        <EmptyState title="Nothing in the queue matches">
          {stateFilter === "open" && !category
            ? "No item waits for a safety officer. New cryogenics, radiation and incident entries appear here as they are written."
            : "Try “All states” or “All categories”."}
        </EmptyState>
      ) : (
        <table className="w-full text-sm" aria-label="Review items">
          <thead className="text-left text-xs text-muted">
            <tr>
              <th className="py-1.5 pr-2">Age</th>
              <th className="pr-2">State</th>
              <th className="pr-2">Category</th>
              <th className="pr-2">Entry</th>
              <th className="pr-2">Written by</th>
              <th className="pr-2">In queue since (UTC)</th>
              <th />
            </tr>
          </thead>
          <tbody>
            {items.map((i) => (
              <tr key={i.reviewId} className="border-t border-line" data-testid={`review-row-${i.entryId}`}>
                <td className="tabular py-1.5 pr-2">{formatAge(now - i.enteredAt.getTime())}</td>
                <td className="pr-2"><ReviewStateBadge state={i.state} /></td>
                <td className="pr-2">{categoryWords(i.category)}{i.needsSafetyReview && <span className="ml-1 text-xs text-muted">(marked)</span>}</td>
                <td className="pr-2">
                  <Link href={`/logbook/${i.entryId}`} className="text-accent underline">{i.title}</Link>
                  <span className="ml-1 text-xs text-muted">rev. {i.currentRevision}{i.retracted && " · retracted"}</span>
                </td>
                <td className="pr-2">{i.authorName}</td>
                <td className="pr-2"><Time at={i.enteredAt} /></td>
                <td><Link href={`/safety/reviews/${i.reviewId}`} className="rounded border border-line px-2 py-0.5 text-xs hover:bg-raised" aria-label={`Review ${i.title}`}>Review</Link></td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </div>
  );
}
