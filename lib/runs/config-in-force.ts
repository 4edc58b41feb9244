/** Which detector configuration applies at an instant: the latest one of that detector effective at or before it. */

/** The minimum a configuration needs for the choice. */
export interface DatedConfig {
  id: number;
  detector: string;
  effectiveFromMs: number;
}

/**
 * The configuration in force for a detector at `atMs`, or null if none had started by then. Two configurations
 * from the same instant: the later-created (higher id) wins, as it was entered to supersede the other.
 */
export function configInForce<T extends DatedConfig>(configs: readonly T[], detector: string, atMs: number): T | null {
  let best: T | null = null;
  for (const c of configs) {
    if (c.detector !== detector || c.effectiveFromMs > atMs) continue;
    if (!best || c.effectiveFromMs > best.effectiveFromMs || (c.effectiveFromMs === best.effectiveFromMs && c.id > best.id)) best = c;
  }
  return best;
}
