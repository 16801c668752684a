/**
 * A waiting line served in turns by lab: each lab keeps its own first-come order, and the next item
 * comes from the waiting lab served longest ago, so one lab's many jobs never hold another lab's job
 * behind them.
 */
export class LabTurns<T> {
  private readonly waiting = new Map<number, T[]>();
  /** When each lab last had a job started (a running count); a lab never served goes first. */
  private readonly lastServed = new Map<number, number>();
  private serving = 0;

  get size(): number {
    let count = 0;
    for (const items of this.waiting.values()) count += items.length;
    return count;
  }

  push(labId: number, item: T): void {
    const items = this.waiting.get(labId);
    if (items) items.push(item);
    else this.waiting.set(labId, [item]);
  }

  /** Records that a job of this lab started (whether it waited or not). */
  served(labId: number): void {
    this.serving += 1;
    this.lastServed.set(labId, this.serving);
  }

  /** The next item, from the waiting lab served longest ago; that lab is then recorded as served. */
  shift(): T | undefined {
    let next: number | undefined;
    for (const labId of this.waiting.keys()) {
      if (next === undefined || (this.lastServed.get(labId) ?? 0) < (this.lastServed.get(next) ?? 0)) next = labId;
    }
    if (next === undefined) return undefined;
    const items = this.waiting.get(next) as T[];
    const item = items.shift();
    if (items.length === 0) this.waiting.delete(next);
    this.served(next);
    return item;
  }

  remove(labId: number, item: T): void {
    const items = this.waiting.get(labId);
    const at = items?.indexOf(item) ?? -1;
    if (!items || at < 0) return;
    items.splice(at, 1);
    if (items.length === 0) this.waiting.delete(labId);
  }
}
