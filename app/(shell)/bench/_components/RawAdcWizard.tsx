'use client';

import { useEffect, useEffectEvent, useRef, useState } from 'react';
import { findLineProfile } from '@/lib/scale/line-format';
import { rawToReading, type AdcCalibration } from '@/lib/scale/raw-adc';
import { createReadingHub, type Reading, type ReadingSource } from '@/lib/scale/reading';
import { createSerialSource, type SerialPortLike, type SerialSource } from '@/lib/scale/serial-source';
import type { ScaleDto } from '@/lib/contracts/scales';
import { calibrate, effectiveDivisionOf, parseCalibration, zeroFrom, type AdcSetup } from '../_lib/adc-calibration';
import { browserStore } from './browser-store';

const calKey = (scaleId: number) => `tallyforge.bench.adc.${scaleId}`;
/** Raw readings averaged for the zero and for the reference (our choice: about a few seconds). */
const CAPTURE_READINGS = 40;

// A bare load-cell front end sends one raw converter value per line. Zero it empty, put a known
// mass on, and the zero and slope are kept on this workstation.
export function RawAdcWizard({ scale, onSource }: { scale: ScaleDto; onSource(source: ReadingSource | null): void }) {
  const conn = scale.connection.kind === 'raw_adc' ? scale.connection : null;
  const setup: AdcSetup = { reversedExcitation: conn?.reversedExcitation ?? false, averaging: conn?.averaging ?? 1 };
  const [calibration, setCalibration] = useState<AdcCalibration | null>(null);
  const [zero, setZero] = useState<number | null>(null);
  const [reference, setReference] = useState('500');
  const [connected, setConnected] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const raws = useRef<number[]>([]);
  const serial = useRef<SerialSource | null>(null);
  // The calibration as the serial subscription (set up on Connect) reads it, kept in step after each render.
  const calRef = useRef<AdcCalibration | null>(null);
  useEffect(() => {
    calRef.current = calibration;
  }, [calibration]);
  const hub = useRef(createReadingHub());

  const announce = useEffectEvent((source: ReadingSource | null) => onSource(source));
  useEffect(() => {
    setCalibration(parseCalibration(browserStore.getItem(calKey(scale.id))));
    const out: ReadingSource = { kind: 'raw-adc', start: async () => undefined, stop: async () => undefined, subscribe: (l) => hub.current.subscribe(l) };
    announce(out);
    return () => {
      void serial.current?.stop();
      announce(null);
    };
  }, [scale.id]);

  const onRaw = (r: Reading) => {
    raws.current.push(r.gross);
    if (raws.current.length > 4 * CAPTURE_READINGS) raws.current.splice(0, raws.current.length - 2 * CAPTURE_READINGS);
    const cal = calRef.current;
    const n = raws.current.length;
    if (!cal) return;
    const signal = setup.reversedExcitation ? (n % 2 === 0 ? (raws.current[n - 2] - raws.current[n - 1]) / 2 : null) : r.gross;
    if (signal !== null) hub.current.emit(rawToReading(signal, cal, r.t, scale.division));
  };

  const connect = async () => {
    const nav = navigator as { serial?: { requestPort(): Promise<SerialPortLike> } };
    if (!nav.serial) return setError('This browser cannot reach serial ports. Type the weights instead.');
    try {
      const port = await nav.serial.requestPort();
      const source = createSerialSource({ port, settings: { baudRate: 9600 }, profile: findLineProfile('plain-grams')! });
      source.subscribe(onRaw);
      await source.start();
      serial.current = source;
      setConnected(true);
      setError(null);
    } catch {
      setError('No port was opened. Choose the front end’s port in the browser’s list.');
    }
  };

  const last = () => raws.current.slice(-CAPTURE_READINGS);
  const takeZero = () => {
    if (last().length < 4) return setError('Not enough raw readings yet.');
    setZero(zeroFrom(last(), setup));
  };
  const takeSpan = () => {
    const mass = Number(reference.replace(',', '.'));
    if (zero === null || !(mass > 0)) return setError('Zero the empty pan first, and give the reference mass in grams.');
    try {
      const cal = calibrate(zero, last(), mass, setup);
      setCalibration(cal);
      browserStore.setItem(calKey(scale.id), JSON.stringify(cal));
      setError(null);
    } catch {
      setError('The reference mass made no difference to the reading. Check that it is on the pan.');
    }
  };

  return (
    <section aria-labelledby="adc-title" className="card space-y-3">
      <h2 id="adc-title" className="font-bold">
        Load-cell front end
      </h2>
      <button type="button" className="btn-primary min-h-12" onClick={() => void connect()}>
        {connected ? 'Connected — choose again' : 'Choose port and connect'}
      </button>
      <ol className="list-decimal space-y-3 pl-5">
        <li>
          Empty the pan, wait, then{' '}
          <button type="button" className="btn-quiet min-h-11" onClick={takeZero} disabled={!connected}>
            Capture zero
          </button>
          {zero !== null ? <span className="num ml-2 text-sm">zero {zero.toFixed(1)} counts</span> : null}
        </li>
        <li className="space-y-2">
          <label htmlFor="adc-ref" className="field-label">
            Reference mass on the pan, g
          </label>
          <input id="adc-ref" className="field num" inputMode="decimal" value={reference} onChange={(e) => setReference(e.target.value)} />
          <button type="button" className="btn-quiet min-h-11" onClick={takeSpan} disabled={!connected || zero === null}>
            Capture reference
          </button>
        </li>
      </ol>
      {calibration ? (
        <p className="num text-sm" data-testid="adc-calibration">
          Saved on this workstation: zero {calibration.zero.toFixed(1)}, slope {calibration.slope.toFixed(3)} counts/g · effective division{' '}
          {effectiveDivisionOf(calibration, setup).toPrecision(2)} g
        </p>
      ) : (
        <p className="text-sm text-ink-soft">Not calibrated on this workstation yet.</p>
      )}
      <p className="field-error" aria-live="polite">
        {error}
      </p>
    </section>
  );
}
