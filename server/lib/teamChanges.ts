/**
 * A per-team change counter: anything that alters what the map shows bumps it, and cached tiles keyed
 * by the counter fall out of use at once (no stale map after an edit or an import).
 */
export class TeamChanges {
  private readonly generations = new Map<string, number>();

  generation(teamId: string): number {
    return this.generations.get(teamId) ?? 0;
  }

  bump(teamId: string): void {
    this.generations.set(teamId, this.generation(teamId) + 1);
  }
}

/** A small LRU with a time limit, for tiles: Map keeps insertion order, so the first key is the oldest. */
export class TtlCache<V> {
  private readonly entries = new Map<string, { value: V; expires: number }>();

  constructor(
    private readonly maxEntries = 2000,
    private readonly ttlMs = 60_000,
  ) {}

  get(key: string): V | undefined {
    const e = this.entries.get(key);
    if (!e) return undefined;
    if (e.expires < Date.now()) {
      this.entries.delete(key);
      return undefined;
    }
    this.entries.delete(key);
    this.entries.set(key, e);
    return e.value;
  }

  set(key: string, value: V): void {
    this.entries.delete(key);
    this.entries.set(key, { value, expires: Date.now() + this.ttlMs });
    while (this.entries.size > this.maxEntries) this.entries.delete(this.entries.keys().next().value as string);
  }
}
