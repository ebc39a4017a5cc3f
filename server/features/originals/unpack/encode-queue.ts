// Keeps a few encodes in flight while the next motif is decoded on the main thread: sharp
// encodes on libuv threads, so decoding and PNG encoding overlap. Each task holds one RGBA
// buffer, so the limit also bounds memory.
export class EncodeQueue<T> {
  private readonly pending: Promise<{ ok: true; value: T } | { ok: false; error: unknown }>[] = [];
  private readonly settled: ({ ok: true; value: T } | { ok: false; error: unknown })[] = [];

  constructor(private readonly limit: number) {}

  async add(task: () => Promise<T>): Promise<void> {
    while (this.pending.length >= this.limit) this.settled.push(await this.pending.shift()!);
    this.throwFirstError();
    this.pending.push(task().then((value) => ({ ok: true as const, value }), (error: unknown) => ({ ok: false as const, error })));
  }

  async drain(): Promise<T[]> {
    while (this.pending.length > 0) this.settled.push(await this.pending.shift()!);
    this.throwFirstError();
    return this.settled.map((entry) => (entry as { value: T }).value);
  }

  get inFlight(): number {
    return this.pending.length;
  }

  private throwFirstError(): void {
    const failed = this.settled.find((entry) => !entry.ok);
    if (failed && !failed.ok) throw failed.error;
  }
}
