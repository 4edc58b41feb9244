import { Badge } from "@/components/ui/Badge";
import { formatAge } from "./age";
import type { SourceDescription } from "./source-status";

/** Where a source is, as icon + word: in store, out (due back at …) or overdue (by …). */
export function CheckoutBadge({ checkout }: { checkout: SourceDescription["checkout"] }) {
  if (checkout.state === "in_store") return <Badge tone="good" icon="▣">In store</Badge>;
  const due = "dueAt" in checkout && checkout.dueAt ? checkout.dueAt.slice(0, 16).replace("T", " ") : "";
  if (checkout.state === "overdue") {
    const by = "overdueByMs" in checkout && checkout.overdueByMs !== undefined ? formatAge(checkout.overdueByMs) : "";
    return <Badge tone="bad" icon="⚠" title={`due back ${due} UTC`}>Overdue{by && ` by ${by}`}</Badge>;
  }
  return <Badge tone="info" icon="↗" title={`due back ${due} UTC`}>Checked out, due {due} UTC</Badge>;
}

/** Leak-test standing as icon + word. */
export function LeakBadge({ leak }: { leak: SourceDescription["leakTest"] }) {
  const due = "dueAt" in leak && leak.dueAt ? leak.dueAt.slice(0, 10) : "";
  switch (leak.state) {
    case "not_required":
      return <span className="text-xs text-muted">not leak-tested (gaseous)</span>;
    case "none_recorded":
      return <Badge tone="bad" icon="?">No leak test on record</Badge>;
    case "overdue":
      return <Badge tone="bad" icon="⚠">Leak test overdue (due {due})</Badge>;
    case "due_soon":
      return <Badge tone="warn" icon="◔">Leak test due {due}</Badge>;
    default:
      return <Badge tone="good" icon="✓">Leak test OK, next {due}</Badge>;
  }
}

/** Sealed or gaseous, as icon + word. */
export function FormBadge({ form }: { form: "sealed" | "gaseous" }) {
  return form === "sealed" ? <Badge tone="muted" icon="◼">Sealed</Badge> : <Badge tone="accent" icon="≋">Gaseous</Badge>;
}
