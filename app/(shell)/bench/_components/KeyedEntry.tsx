'use client';

import { useEffect, useEffectEvent, useRef, useState } from 'react';
import { createKeyedSource, type KeyedSource } from '@/lib/scale/keyed-source';
import type { ReadingSource } from '@/lib/scale/reading';

// The fallback for any scale: read the display and type the weight; each entry is a settled reading.
export function KeyedEntry({ onSource }: { onSource(source: ReadingSource | null): void }) {
  const sourceRef = useRef<KeyedSource | null>(null);
  const [text, setText] = useState('');
  const [error, setError] = useState<string | null>(null);

  const announce = useEffectEvent((source: ReadingSource | null) => onSource(source));
  useEffect(() => {
    const source = createKeyedSource({ unit: 'g' });
    void source.start();
    sourceRef.current = source;
    announce(source);
    return () => {
      void source.stop();
      announce(null);
    };
  }, []);

  const enter = () => {
    try {
      sourceRef.current!.enter(text);
      setError(null);
      setText('');
    } catch {
      setError('Type the weight in grams as a plain number, e.g. 152.4');
    }
  };

  return (
    <section aria-labelledby="keyed-title" className="card space-y-2">
      <h2 id="keyed-title" className="font-bold">
        Type the weight the scale shows
      </h2>
      <form
        className="flex items-end gap-2"
        onSubmit={(e) => {
          e.preventDefault();
          enter();
        }}
      >
        <div className="flex-1">
          <label htmlFor="keyed-weight" className="field-label">
            Gross weight, g
          </label>
          <input id="keyed-weight" className="field num text-lg" inputMode="decimal" value={text} onChange={(e) => setText(e.target.value)} />
        </div>
        <button type="submit" className="btn-primary min-h-12">
          Enter weight
        </button>
      </form>
      <p className="field-error" aria-live="polite">
        {error}
      </p>
    </section>
  );
}
