/**
 * Summarises a Chromium trace (Playwright's browser.startTracing / stopTracing) of the UI drag
 * benchmark: time per pointer move spent on the page's main thread by kind of work (script,
 * style, layout, paint recording, commit) and on the raster threads. Used by ui-drag.bench.ts
 * when BENCH_TRACE=1; printed, never asserted.
 */

/** Trace categories that carry the timeline events summarised here. */
export const TRACE_CATEGORIES = [
  'devtools.timeline',
  'disabled-by-default-devtools.timeline',
  'blink',
  'cc',
];

interface TraceEvent {
  name: string;
  ph: string;
  pid: number;
  tid: number;
  dur?: number;
  args?: { name?: string };
}

/** Main-thread kinds of work, by trace event name (these do not nest inside each other). */
const MAIN: Record<string, string> = {
  FunctionCall: 'script',
  EventDispatch: 'script',
  TimerFire: 'script',
  FireAnimationFrame: 'script',
  RunMicrotasks: 'script',
  UpdateLayoutTree: 'style',
  Layout: 'layout',
  PrePaint: 'pre-paint',
  Paint: 'paint',
  Layerize: 'layerize',
  Commit: 'commit',
};

/** Lines of "kind  ms per move" for the renderer that did the most work. */
export function traceLines(trace: Buffer | string, moves: number): string[] {
  const { traceEvents } = JSON.parse(String(trace)) as { traceEvents: TraceEvent[] };
  const threadNames = new Map<string, string>();
  for (const e of traceEvents)
    if (e.ph === 'M' && e.name === 'thread_name' && e.args?.name)
      threadNames.set(`${e.pid}:${e.tid}`, e.args.name);
  const totals = new Map<string, Map<string, number>>();
  const add = (pid: number, kind: string, us: number) => {
    const key = String(pid);
    if (!totals.has(key)) totals.set(key, new Map());
    const m = totals.get(key)!;
    m.set(kind, (m.get(kind) ?? 0) + us);
  };
  for (const e of traceEvents) {
    if (e.ph !== 'X' || e.dur === undefined) continue;
    const thread = threadNames.get(`${e.pid}:${e.tid}`) ?? '';
    if (thread === 'CrRendererMain') {
      if (e.name === 'ThreadControllerImpl::RunTask' || e.name === 'RunTask')
        add(e.pid, 'all tasks', e.dur);
      const kind = MAIN[e.name];
      if (kind) add(e.pid, kind, e.dur);
    } else if (/CompositorTileWorker|Raster/.test(thread) && /Raster/.test(e.name)) {
      add(e.pid, 'raster (worker threads)', e.dur);
    } else if (thread === 'Compositor' && e.name === 'ProxyImpl::ScheduledActionDraw') {
      add(e.pid, 'draw (compositor thread)', e.dur);
    }
  }
  let busiest: Map<string, number> | null = null;
  for (const m of totals.values())
    if (!busiest || (m.get('all tasks') ?? 0) > (busiest.get('all tasks') ?? 0)) busiest = m;
  if (!busiest) return ['  (no renderer main-thread events in the trace)'];
  return [...busiest.entries()]
    .sort((a, b) => b[1] - a[1])
    .map(([kind, us]) => `    ${(us / 1000 / moves).toFixed(2).padStart(8)} ms/move  ${kind}`);
}
