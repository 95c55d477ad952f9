import { useCallback, useEffect, useRef, useState } from 'preact/hooks';
import { ReadingBuffer } from '../../run/index.ts';
import { SimulatedSource } from '../../sensor/simulated/simulatedSource.ts';

export type RunStatus = 'idle' | 'running' | 'ended';

export interface LiveRun {
  status: RunStatus;
  readings: ReadingBuffer;
  /** Bumped once per batch of readings (at most a few times a second). */
  version: number;
  speed: number;
  sourceLabel: string;
  start(): void;
  end(): void;
  setSpeed(speed: number): void;
}

/** A run fed by the simulated source: readings land in a columnar buffer, batched per tick. */
export function useLiveRun(initialSpeed = 30): LiveRun {
  const readings = useRef(new ReadingBuffer()).current;
  const source = useRef<SimulatedSource | null>(null);
  const [status, setStatus] = useState<RunStatus>('idle');
  const [version, setVersion] = useState(0);
  const [speed, setSpeedState] = useState(initialSpeed);

  const start = useCallback(() => {
    readings.clear();
    const simulated = new SimulatedSource({ speed });
    source.current = simulated;
    simulated.start((batch) => {
      if (batch.length === 0) return;
      for (const r of batch) readings.append(r.timeS, r.headC);
      setVersion((v) => v + 1);
    });
    setStatus('running');
  }, [readings, speed]);

  const end = useCallback(() => {
    source.current?.stop();
    source.current = null;
    setStatus('ended');
  }, []);

  const setSpeed = useCallback((value: number) => {
    setSpeedState(value);
    if (source.current) source.current.speed = value;
  }, []);

  useEffect(() => () => source.current?.stop(), []);

  return { status, readings, version, speed, sourceLabel: 'Simulated run (demo)', start, end, setSpeed };
}
