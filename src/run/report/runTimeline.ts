import type { RunRecord } from '../runRecord.ts';

export interface TimelineEntry {
  /** Units: s since heat on */
  timeS: number;
  kind: 'event' | 'alarm' | 'receiver' | 'heat' | 'note' | 'gap';
  text: string;
  headC: number | null;
}

/** Everything that happened in a run, in time order: events, alarms, receiver and heat changes, notes, gaps. */
export function runTimeline(run: Pick<RunRecord, 'events' | 'alerts' | 'receivers' | 'heat_changes' | 'notes' | 'gaps'>): TimelineEntry[] {
  const entries: TimelineEntry[] = [
    ...run.events.map((e) => ({ timeS: e.time_s, kind: 'event' as const, text: e.event, headC: e.head_c })),
    ...run.alerts.map((a) => ({
      timeS: a.time_s,
      kind: 'alarm' as const,
      text: `${a.message}${a.acknowledged_at ? ` (acknowledged ${a.acknowledged_at.slice(11, 19)})` : ' (not acknowledged)'}`,
      headC: null,
    })),
    ...run.receivers.filter((r) => r.time_s > 0).map((r) => ({ timeS: r.time_s, kind: 'receiver' as const, text: `receiver ${r.receiver} under`, headC: r.head_c })),
    ...run.heat_changes.map((h) => ({ timeS: h.time_s, kind: 'heat' as const, text: h.text, headC: null })),
    ...run.notes.map((n) => ({ timeS: n.time_s, kind: 'note' as const, text: n.text, headC: null })),
    ...run.gaps.map((g) => ({ timeS: g.from_s, kind: 'gap' as const, text: `no readings for ${Math.round(g.to_s - g.from_s)} s: ${g.reason}`, headC: null })),
  ];
  // Stable: same-time entries keep the order above.
  return entries.map((e, i) => [e, i] as const).sort((a, b) => a[0].timeS - b[0].timeS || a[1] - b[1]).map(([e]) => e);
}
