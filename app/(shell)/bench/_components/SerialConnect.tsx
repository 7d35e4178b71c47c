'use client';

import { useEffect, useEffectEvent, useRef, useState } from 'react';
import { findLineProfile, LINE_PROFILES } from '@/lib/scale/line-format';
import type { ReadingSource } from '@/lib/scale/reading';
import { createSerialSource, type SerialPortLike, type SerialSource, type SerialStats } from '@/lib/scale/serial-source';
import type { ScaleDto } from '@/lib/contracts/scales';
import { BAUD_RATES, serialSettingsFrom, unescapeRequest, type SerialPortSettings } from '../_lib/serial-settings';
import { browserStore } from './browser-store';

interface SerialNavigator {
  serial?: { requestPort(): Promise<SerialPortLike> };
}

const settingsKey = (scaleId: number) => `tallyforge.bench.serial.${scaleId}`;

// Web Serial: the scale's port settings (editable, kept on this workstation), then the browser's port chooser.
export function SerialConnect({ scale, onSource }: { scale: ScaleDto; onSource(source: ReadingSource | null): void }) {
  const profile = scale.connection.kind === 'serial' ? scale.connection : {};
  const [settings, setSettings] = useState<SerialPortSettings>(() => serialSettingsFrom(profile, null));
  const [stats, setStats] = useState<SerialStats | null>(null);
  const [error, setError] = useState<string | null>(null);
  const sourceRef = useRef<SerialSource | null>(null);

  // The settings this browser last used with the scale, over the scale's own profile.
  const loadSettings = useEffectEvent((scaleId: number) => {
    let saved: unknown = null;
    try {
      saved = JSON.parse(browserStore.getItem(settingsKey(scaleId)) ?? 'null');
    } catch {
      saved = null;
    }
    setSettings(serialSettingsFrom(profile, saved));
  });
  useEffect(() => loadSettings(scale.id), [scale.id]);

  const withdraw = useEffectEvent(() => onSource(null));
  useEffect(() => {
    const timer = setInterval(() => sourceRef.current && setStats(sourceRef.current.stats()), 500);
    return () => {
      clearInterval(timer);
      void sourceRef.current?.stop();
      withdraw();
    };
  }, []);

  const update = <K extends keyof SerialPortSettings>(key: K, value: SerialPortSettings[K]) => {
    const next = { ...settings, [key]: value };
    setSettings(next);
    browserStore.setItem(settingsKey(scale.id), JSON.stringify(next));
  };

  const connect = async () => {
    const serial = (navigator as SerialNavigator).serial;
    if (!serial) {
      setError('This browser cannot reach serial ports. Use Chromium or Edge over https or localhost, or type the weights instead.');
      return;
    }
    try {
      const port = await serial.requestPort();
      await sourceRef.current?.stop();
      const source = createSerialSource({
        port,
        settings: { baudRate: settings.baudRate, dataBits: settings.dataBits, parity: settings.parity, stopBits: settings.stopBits },
        profile: findLineProfile(settings.lineFormat) ?? LINE_PROFILES[0],
        mode:
          settings.mode === 'polled'
            ? { kind: 'polled', request: unescapeRequest(settings.pollRequest), intervalMs: settings.pollIntervalMs }
            : { kind: 'continuous' },
        onError: () => setError('The serial connection stopped. Check the cable and connect again.'),
      });
      await source.start();
      sourceRef.current = source;
      setError(null);
      onSource(source);
    } catch {
      setError('No port was opened. Choose the scale’s port in the browser’s list, and check that no other program holds it.');
    }
  };

  return (
    <section aria-labelledby="serial-title" className="card space-y-3">
      <h2 id="serial-title" className="font-bold">
        Serial connection
      </h2>
      <div className="grid grid-cols-2 gap-3 sm:grid-cols-4">
        <div>
          <label htmlFor="serial-baud" className="field-label">
            Baud rate
          </label>
          <select id="serial-baud" className="field num" value={settings.baudRate} onChange={(e) => update('baudRate', Number(e.target.value))}>
            {BAUD_RATES.map((b) => (
              <option key={b} value={b}>
                {b}
              </option>
            ))}
          </select>
        </div>
        <div>
          <label htmlFor="serial-bits" className="field-label">
            Data bits
          </label>
          <select id="serial-bits" className="field num" value={settings.dataBits} onChange={(e) => update('dataBits', Number(e.target.value) as 7 | 8)}>
            <option value={8}>8</option>
            <option value={7}>7</option>
          </select>
        </div>
        <div>
          <label htmlFor="serial-parity" className="field-label">
            Parity
          </label>
          <select
            id="serial-parity"
            className="field"
            value={settings.parity}
            onChange={(e) => update('parity', e.target.value as SerialPortSettings['parity'])}
          >
            <option value="none">none</option>
            <option value="even">even</option>
            <option value="odd">odd</option>
          </select>
        </div>
        <div>
          <label htmlFor="serial-stop" className="field-label">
            Stop bits
          </label>
          <select id="serial-stop" className="field num" value={settings.stopBits} onChange={(e) => update('stopBits', Number(e.target.value) as 1 | 2)}>
            <option value={1}>1</option>
            <option value={2}>2</option>
          </select>
        </div>
      </div>
      <div>
        <label htmlFor="serial-format" className="field-label">
          Line format
        </label>
        <select id="serial-format" className="field" value={settings.lineFormat} onChange={(e) => update('lineFormat', e.target.value)}>
          {LINE_PROFILES.map((p) => (
            <option key={p.name} value={p.name}>
              {p.description}
            </option>
          ))}
        </select>
      </div>
      <button type="button" className="btn-primary min-h-12" onClick={() => void connect()}>
        Choose port and connect
      </button>
      <p className="text-sm text-ink-soft" data-testid="serial-stats">
        Lines received <span className="num font-bold">{stats?.lines ?? 0}</span> · not understood{' '}
        <span className="num font-bold">{stats?.malformed ?? 0}</span>
      </p>
      <p className="field-error" aria-live="polite">
        {error}
      </p>
    </section>
  );
}
