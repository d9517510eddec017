// Per-route latency and status counts of a load run (every response counted, 2xx or not).

export interface Figures {
  count: number;
  non2xx: number;
  p50: number;
  p90: number;
  p99: number;
  max: number;
  mean: number;
}

function percentile(sorted: number[], p: number): number {
  if (sorted.length === 0) return 0;
  return sorted[Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1))];
}

function figures(latencies: number[], non2xx: number): Figures {
  const sorted = [...latencies].sort((a, b) => a - b);
  const mean = sorted.reduce((sum, value) => sum + value, 0) / Math.max(1, sorted.length);
  const round = (value: number) => Math.round(value * 10) / 10;
  return {
    count: sorted.length,
    non2xx,
    p50: round(percentile(sorted, 50)),
    p90: round(percentile(sorted, 90)),
    p99: round(percentile(sorted, 99)),
    max: round(sorted.at(-1) ?? 0),
    mean: round(mean),
  };
}

/** Collects response times (ms) and non-2xx statuses by route label. */
export class RouteStats {
  private readonly latencies = new Map<string, number[]>();
  private readonly failures = new Map<string, Map<number, number>>();
  /** When each response came (ms since the first) and how long it took, for the time slices. */
  private readonly timeline: { at: number; ms: number }[] = [];
  private readonly started = performance.now();

  add(label: string, status: number, ms: number) {
    this.timeline.push({ at: performance.now() - this.started, ms });
    if (!this.latencies.has(label)) this.latencies.set(label, []);
    this.latencies.get(label)!.push(ms);
    if (status < 200 || status >= 300) {
      const byStatus = this.failures.get(label) ?? new Map<number, number>();
      byStatus.set(status, (byStatus.get(status) ?? 0) + 1);
      this.failures.set(label, byStatus);
    }
  }

  labels(): string[] {
    return [...this.latencies.keys()];
  }

  route(label: string): Figures & { statuses: string } {
    const byStatus = this.failures.get(label) ?? new Map<number, number>();
    const non2xx = [...byStatus.values()].reduce((sum, n) => sum + n, 0);
    return {
      ...figures(this.latencies.get(label) ?? [], non2xx),
      statuses: [...byStatus].map(([status, n]) => `${status}×${n}`).join(' '),
    };
  }

  /** p50/p99 of the responses that came in each `seconds`-long slice of the run (shows a warm-up tail apart from the steady state). */
  slices(seconds: number): { from: number; figures: Figures }[] {
    const bySlice = new Map<number, number[]>();
    for (const { at, ms } of this.timeline) {
      const slice = Math.floor(at / 1000 / seconds);
      if (!bySlice.has(slice)) bySlice.set(slice, []);
      bySlice.get(slice)!.push(ms);
    }
    return [...bySlice]
      .sort(([a], [b]) => a - b)
      .map(([slice, latencies]) => ({ from: slice * seconds, figures: figures(latencies, 0) }));
  }

  overall(): Figures {
    const all = [...this.latencies.values()].flat();
    const non2xx = [...this.failures.values()]
      .flatMap((byStatus) => [...byStatus.values()])
      .reduce((sum, n) => sum + n, 0);
    return figures(all, non2xx);
  }
}

/** One line per route: requests per second, latency percentiles in ms, non-2xx answers. */
export function printRouteTable(stats: RouteStats, durationS: number) {
  const header = [
    'route'.padEnd(20),
    'req/s'.padStart(7),
    'p50'.padStart(7),
    'p90'.padStart(7),
    'p99'.padStart(7),
    'max'.padStart(7),
    'non-2xx'.padStart(8),
  ];
  console.log(header.join(' '));
  for (const label of stats.labels()) {
    const r = stats.route(label);
    const cells = [
      label.padEnd(20),
      (r.count / durationS).toFixed(1).padStart(7),
      ...[r.p50, r.p90, r.p99, r.max].map((v) => v.toFixed(1).padStart(7)),
      String(r.non2xx).padStart(8),
    ];
    console.log(`${cells.join(' ')}${r.statuses ? `  (${r.statuses})` : ''}`);
  }
  const slices = stats.slices(5).map(({ from, figures: f }) => `${from}–${from + 5} s p50=${f.p50} p99=${f.p99}`);
  console.log(`by time: ${slices.join('; ')}`);
  const all = stats.overall();
  console.log(
    `${'all'.padEnd(20)} ${(all.count / durationS).toFixed(1).padStart(7)} ` +
      `${[all.p50, all.p90, all.p99, all.max].map((v) => v.toFixed(1).padStart(7)).join(' ')} ${String(all.non2xx).padStart(8)}  (ms)`,
  );
}
