'use client';

import { useEffect, useEffectEvent, useRef, useState } from 'react';
import type { ReadingSource } from '@/lib/scale/reading';
import { createReadingPipeline, type LiveFrame, type PipelineScale, type PipelineWork } from '../_lib/reading-pipeline';
import { TraceBuffer } from '../_lib/trace-buffer';

/** An hour at 50 Hz: the trace scrolls back over a whole session without growing. */
const TRACE_CAPACITY = 50 * 3600;

// Runs every reading through the pipeline at the scale's rate; React hears about it at most
// once per animation frame, while actions read the very latest frame from the ref.
export function useReadingFeed(
  source: ReadingSource | null,
  scale: PipelineScale | null,
  work: PipelineWork,
  options: { windowMs: number; defaultPieceSpread: number },
) {
  // Each reading is judged against the count as it stands now, without setting the feed up again.
  const workNow = useEffectEvent(() => work);
  const frameRef = useRef<LiveFrame | null>(null);
  const [frame, setFrame] = useState<LiveFrame | null>(null);
  const [trace] = useState(() => new TraceBuffer(TRACE_CAPACITY));
  const [readings, setReadings] = useState(0);
  const countRef = useRef(0);

  useEffect(() => {
    if (!source || !scale) return;
    const pipeline = createReadingPipeline(scale, { ...options, trace });
    // Each source has its own clock (a new simulator starts at 0): carry on the session's time line.
    let offset: number | null = null;
    let scheduled = 0;
    const publish = () => {
      scheduled = 0;
      setFrame(frameRef.current);
      setReadings(countRef.current);
    };
    const unsubscribe = source.subscribe((reading) => {
      offset ??= (trace.newestTime() ?? 0) + 1 - reading.t;
      frameRef.current = pipeline.push(offset === 0 ? reading : { ...reading, t: reading.t + offset }, workNow());
      countRef.current += 1;
      if (!scheduled) scheduled = requestAnimationFrame(publish);
    });
    return () => {
      unsubscribe();
      if (scheduled) cancelAnimationFrame(scheduled);
      frameRef.current = null;
      setFrame(null);
    };
  }, [source, scale, options, trace]);

  return { frame, frameRef, trace, readings };
}
