/**
 * The points of an open chain (a line element, a strip's centreline): the start, then each
 * segment's end and, for an arc, its through-point, each as an editable point.
 */
import type { PathSegment, Point } from '../../src';
import { PointFields } from './PointFields';

export function ChainFields({
  start,
  segments,
  units,
  onChange,
}: {
  start: Point;
  segments: readonly PathSegment[];
  units: string;
  /** Apply a new start and segments; returns a refusal or null. */
  onChange: (start: Point, segments: PathSegment[]) => string | null;
}) {
  const setSegment = (i: number, f: (g: PathSegment) => PathSegment) => onChange(start, segments.map((g, k) => (k === i ? f(g) : g)));
  return (
    <div className="vertex-list">
      <PointFields label="Start" p={start} field="start" units={units} onPoint={(q) => onChange(q, segments.slice())} />
      {segments.map((g, i) => (
        <div key={i} className="segment">
          {g.via && <PointFields label={`Arc ${i + 1} through`} p={g.via} field={`segments[${i}].via`} units={units} onPoint={(q) => setSegment(i, (o) => ({ ...o, via: q }))} />}
          <PointFields label={`${g.via ? 'Arc' : 'Line'} ${i + 1} to`} p={g.to} field={`segments[${i}].to`} units={units} onPoint={(q) => setSegment(i, (o) => ({ ...o, to: q }))} />
        </div>
      ))}
    </div>
  );
}

/** Handles of an open chain: its start, every segment end and every arc's through-point. */
export function chainHandles(start: Point, segments: readonly PathSegment[]) {
  const out: { ref: { kind: 'start' } | { kind: 'to'; index: number } | { kind: 'via'; index: number }; p: Point }[] = [{ ref: { kind: 'start' }, p: start }];
  segments.forEach((g, index) => {
    out.push({ ref: { kind: 'to', index }, p: g.to });
    if (g.via) out.push({ ref: { kind: 'via', index }, p: g.via });
  });
  return out;
}
