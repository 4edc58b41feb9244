"use client";
import { useState } from "react";

/** Switches between the night (dark) and day (light) themes; remembered in a cookie. */
export function ThemeToggle({ initial }: { initial: "night" | "day" }) {
  const [theme, setTheme] = useState(initial);
  const flip = () => {
    const next = theme === "night" ? "day" : "night";
    document.documentElement.dataset.theme = next;
    document.cookie = `theme=${next}; path=/; max-age=31536000; samesite=lax`;
    setTheme(next);
  };
  return (
    <button type="button" onClick={flip} className="rounded border border-line px-2 py-1 text-xs text-muted hover:text-ink" aria-label="Switch theme">
      {theme === "night" ? "☾ Night" : "☀ Day"}
    </button>
  );
}
