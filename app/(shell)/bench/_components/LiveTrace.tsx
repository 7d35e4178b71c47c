'use client';

import 'uplot/dist/uPlot.min.css';
import { useEffect, useEffectEvent, useRef, useState } from 'react';
import type uPlotType from 'uplot';
import type { LiveFrame } from '../_lib/reading-pipeline';
import type { TraceBuffer, TraceMarkKind } from '../_lib/trace-buffer';
import { weightAxis } from '../_lib/weight-axis';

const SPAN_MS = 30_000;
const MARK_COLOURS: Record<TraceMarkKind, string> = { tare: '#6b7780', sample: '#1f5a70', grow: '#2f7d57', capture: '#c28a2c' };

interface Props {
  trace: TraceBuffer;
  frameRef: { current: LiveFrame | null };
  division: number;
  windowMs: number;
}

// The weight over time: the chart is made once; each animation frame copies the visible window
// out of the ring buffer and redraws only when a reading arrived.
export function LiveTrace({ trace, frameRef, division, windowMs }: Props) {
  const box = useRef<HTMLDivElement>(null);
  const [lookBack, setLookBack] = useState(0); // seconds before now
  // Read by the drawing loop, which is set up once: the look-back as it is now.
  const lookBackNow = useEffectEvent(() => lookBack);
  const [sessionS, setSessionS] = useState(0);

  useEffect(() => {
    let chart: uPlotType | null = null;
    let raf = 0;
    let drawnNewest: number | undefined;
    let drawnLookBack = -1;
    let disposed = false;
    let t0: number | undefined;

    const drawOverlay = (u: uPlotType) => {
      const ctx = u.ctx;
      const f = frameRef.current;
      const { left, top, width, height } = u.bbox;
      ctx.save();
      ctx.beginPath();
      ctx.rect(left, top, width, height);
      ctx.clip();
      // Stability band: ±1 d around the window mean over the last window, while settled.
      if (f?.stable && lookBackNow() === 0 && t0 !== undefined) {
        const y1 = u.valToPos(f.mean + division, 'y', true);
        const y2 = u.valToPos(f.mean - division, 'y', true);
        const x1 = u.valToPos((f.t - windowMs - t0) / 1000, 'x', true);
        const x2 = u.valToPos((f.t - t0) / 1000, 'x', true);
        ctx.fillStyle = 'rgba(47,125,87,0.22)';
        // At least 6 px tall, or a ±1 d band on a heavy load would vanish into the line.
        const h = Math.max(6 * devicePixelRatio, Math.abs(y2 - y1));
        ctx.fillRect(x1, (y1 + y2) / 2 - h / 2, x2 - x1, h);
      }
      for (const m of trace.marks) {
        if (t0 === undefined) break;
        const x = u.valToPos((m.t - t0) / 1000, 'x', true);
        if (x < left || x > left + width) continue;
        ctx.strokeStyle = MARK_COLOURS[m.kind];
        ctx.lineWidth = 2 * devicePixelRatio;
        ctx.beginPath();
        ctx.moveTo(x, top);
        ctx.lineTo(x, top + height);
        ctx.stroke();
        ctx.fillStyle = MARK_COLOURS[m.kind];
        ctx.font = `${12 * devicePixelRatio}px sans-serif`;
        ctx.fillText(m.label, x + 4, top + 14 * devicePixelRatio);
      }
      ctx.restore();
    };

    const loop = () => {
      raf = requestAnimationFrame(loop);
      const newest = trace.newestTime();
      if (!chart || newest === undefined) return;
      const back = lookBackNow();
      if (newest === drawnNewest && back === drawnLookBack) return;
      t0 ??= trace.oldestTime();
      drawnNewest = newest;
      drawnLookBack = back;
      const end = newest - back * 1000;
      const w = trace.window(end - SPAN_MS, end);
      const xs = Array.from(w.t, (t) => (t - t0!) / 1000);
      chart.setData([xs, Array.from(w.gross)]);
      setSessionS(Math.floor((newest - (trace.oldestTime() ?? newest)) / 1000));
    };

    const weight = weightAxis(division);
    void import('uplot').then(({ default: UPlot }) => {
      if (disposed || !box.current) return;
      chart = new UPlot(
        {
          width: box.current.clientWidth,
          height: 180,
          scales: { x: { time: false }, y: { range: (_u, min, max) => weight.range(min, max) } },
          axes: [{ label: 's' }, { label: 'g', size: 70, incrs: weight.incrs, values: (_u, ticks) => ticks.map(weight.format) }],
          legend: { show: false },
          cursor: { show: false },
          series: [{}, { stroke: '#1f5a70', width: 2, points: { show: false } }],
          hooks: { draw: [drawOverlay] },
        },
        [[], []],
        box.current,
      );
      raf = requestAnimationFrame(loop);
    });
    const resize = () => chart && box.current && chart.setSize({ width: box.current.clientWidth, height: 180 });
    window.addEventListener('resize', resize);
    return () => {
      disposed = true;
      cancelAnimationFrame(raf);
      window.removeEventListener('resize', resize);
      chart?.destroy();
    };
  }, [trace, frameRef, division, windowMs]);

  return (
    <section aria-labelledby="trace-title" className="card space-y-2">
      <div className="flex items-center justify-between">
        <h2 id="trace-title" className="font-bold">
          Weight over time
        </h2>
        <span className="text-xs text-ink-faint">green band: settled (drawn ±1 d wide)</span>
      </div>
      <div ref={box} data-testid="trace" />
      <label className="flex items-center gap-3 text-sm">
        <span className="shrink-0">Look back</span>
        <input
          type="range"
          min={0}
          max={Math.max(0, sessionS)}
          value={Math.min(lookBack, sessionS)}
          onChange={(e) => setLookBack(Number(e.target.value))}
          className="min-h-11 flex-1"
          aria-label="Seconds to look back"
        />
        <span className="num w-16 text-right">{lookBack === 0 ? 'live' : `−${lookBack} s`}</span>
      </label>
    </section>
  );
}
