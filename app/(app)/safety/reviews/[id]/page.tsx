import Link from "next/link";
import { notFound } from "next/navigation";
import { getQueueItem, reviewEvents } from "@/db/safety";
import { requireRole } from "@/lib/auth/guards";
import { Time } from "@/components/ui/Time";
import { formatAge } from "@/components/safety/age";
import { MoveForm } from "@/components/safety/MoveForm";
import { ReviewStateBadge } from "@/components/safety/ReviewStateBadge";
import { MOVE_VERBS, REVIEW_MOVES } from "@/components/safety/review-flow";

export const metadata = { title: "Safety review item" };
export const dynamic = "force-dynamic";

export default async function ReviewItemPage({ params }: { params: Promise<{ id: string }> }) {
  await requireRole("safety.review");
  const id = Number((await params).id);
  const item = Number.isSafeInteger(id) && id > 0 ? await getQueueItem({ reviewId: id }) : null;
  if (!item) notFound();
  const events = await reviewEvents(item.reviewId);
  const moves = REVIEW_MOVES[item.state].map((to) => ({ to, verb: MOVE_VERBS[to] }));
  return (
    <div className="max-w-3xl">
      <p className="mb-2 text-sm"><Link href="/safety" className="text-accent underline">← Review queue</Link></p>
      <h1 className="text-xl font-semibold">{item.title}</h1>
      <dl className="my-3 grid grid-cols-[max-content_1fr] gap-x-4 gap-y-1 text-sm">
        <dt className="text-muted">State</dt>
        <dd data-testid="review-state"><ReviewStateBadge state={item.state} /></dd>
        <dt className="text-muted">Entry</dt>
        <dd>
          <Link href={`/logbook/${item.entryId}`} className="text-accent underline">Entry #{item.entryId}</Link>, revision {item.currentRevision}
          {item.reviewedRevision !== null && <span className="text-muted"> (last reviewed at revision {item.reviewedRevision})</span>}
          {item.retracted && <span className="text-muted"> · retracted</span>}
        </dd>
        <dt className="text-muted">Category</dt>
        <dd>{item.category.replace(/_/g, " ")}{item.needsSafetyReview && " · marked “needs safety review”"}</dd>
        <dt className="text-muted">Written by</dt>
        <dd>{item.authorName}</dd>
        <dt className="text-muted">In queue since</dt>
        <dd><Time at={item.enteredAt} /> UTC ({formatAge(Date.now() - item.enteredAt.getTime())})</dd>
      </dl>
      <MoveForm reviewId={item.reviewId} moves={moves} />
      <h2 className="mb-2 mt-6 font-semibold">Trail</h2>
      <ol className="space-y-2 text-sm" aria-label="Review trail">
        {events.map((e) => (
          <li key={e.id} className="rounded border border-line bg-panel px-3 py-2">
            <div className="flex flex-wrap items-center gap-2">
              <Time at={e.at} />
              {e.fromState && <><ReviewStateBadge state={e.fromState} /><span aria-hidden>→</span><span className="sr-only">to</span></>}
              <ReviewStateBadge state={e.toState} />
              <span className="text-muted">{e.actorName ?? "Deepshift"}</span>
            </div>
            <p className="mt-1 whitespace-pre-wrap">{e.comment}</p>
          </li>
        ))}
      </ol>
    </div>
  );
}
