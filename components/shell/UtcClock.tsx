"use client";
import { useEffect, useState } from "react";

function utcNow(): string {
  return new Date().toISOString().slice(0, 19).replace("T", " ");
}

/** A ticking UTC clock; local time on hover. */
export function UtcClock() {
  const [now, setNow] = useState<string | null>(null);
  useEffect(() => {
    const tick = () => setNow(utcNow());
    tick();
    const t = setInterval(tick, 1000);
    return () => clearInterval(t);
  }, []);
  return (
    <time className="font-mono text-sm tabular text-ink" title={now ? `local: ${new Date().toLocaleString()}` : undefined} data-testid="utc-clock">
      {now ?? "—"} <span className="text-muted">UTC</span>
    </time>
  );
}
