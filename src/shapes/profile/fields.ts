/**
 * The dimensions of each profile type: their fields in side-panel order, the defaults for a newly
 * placed profile, and the validation that says, per field, why a profile cannot be built.
 */
import type { ProfileDimensionKey, ProfileDimensions, ProfileShape, ProfileType } from './types';

export interface ProfileField<T extends ProfileType> {
  key: ProfileDimensionKey<T>;
  /** Plain-language label for the editor's side panel; messages use it in lower case. */
  label: string;
  /** True for radii, which may be 0 (a sharp corner); every other dimension must be > 0. */
  allowZero: boolean;
  /** True when the field may be left out of the document (treated as 0). */
  optional?: boolean;
}

export interface ProfileIssue {
  /** Field name relative to the shape (the caller prefixes the shape's own path). */
  path: string;
  message: string;
}

/** Numeric fields of each profile type, in side-panel order. */
export const PROFILE_FIELDS: { readonly [T in ProfileType]: readonly ProfileField<T>[] } = {
  rectangle: [
    { key: 'width', label: 'Width', allowZero: false },
    { key: 'height', label: 'Height', allowZero: false },
    { key: 'cornerRadius', label: 'Corner radius', allowZero: true, optional: true },
  ],
  'i-beam': [
    { key: 'depth', label: 'Depth', allowZero: false },
    { key: 'flangeWidth', label: 'Flange width', allowZero: false },
    { key: 'flangeThickness', label: 'Flange thickness', allowZero: false },
    { key: 'webThickness', label: 'Web thickness', allowZero: false },
    { key: 'rootRadius', label: 'Root radius', allowZero: true },
  ],
  channel: [
    { key: 'depth', label: 'Depth', allowZero: false },
    { key: 'flangeWidth', label: 'Flange width', allowZero: false },
    { key: 'flangeThickness', label: 'Flange thickness', allowZero: false },
    { key: 'webThickness', label: 'Web thickness', allowZero: false },
    { key: 'rootRadius', label: 'Root radius', allowZero: true },
  ],
  angle: [
    { key: 'legVertical', label: 'Vertical leg', allowZero: false },
    { key: 'legHorizontal', label: 'Horizontal leg', allowZero: false },
    { key: 'thickness', label: 'Thickness', allowZero: false },
    { key: 'rootRadius', label: 'Root radius', allowZero: true },
  ],
  tee: [
    { key: 'depth', label: 'Depth', allowZero: false },
    { key: 'flangeWidth', label: 'Flange width', allowZero: false },
    { key: 'flangeThickness', label: 'Flange thickness', allowZero: false },
    { key: 'stemThickness', label: 'Stem thickness', allowZero: false },
    { key: 'rootRadius', label: 'Root radius', allowZero: true },
  ],
  'rect-tube': [
    { key: 'width', label: 'Width', allowZero: false },
    { key: 'height', label: 'Height', allowZero: false },
    { key: 'wall', label: 'Wall thickness', allowZero: false },
    { key: 'outerRadius', label: 'Outside corner radius', allowZero: true },
  ],
  'round-tube': [
    { key: 'outerDiameter', label: 'Outside diameter', allowZero: false },
    { key: 'wall', label: 'Wall thickness', allowZero: false },
  ],
  'bent-plate': [
    { key: 'legHorizontal', label: 'Horizontal leg', allowZero: false },
    { key: 'legVertical', label: 'Vertical leg', allowZero: false },
    { key: 'thickness', label: 'Thickness', allowZero: false },
    { key: 'insideRadius', label: 'Inside bend radius', allowZero: true },
  ],
};

/** Default dimensions (mm) for a newly placed profile: round numbers, not a catalogue size. */
export const PROFILE_DEFAULTS: { readonly [T in ProfileType]: Readonly<Required<ProfileDimensions<T>>> } = {
  rectangle: { width: 100, height: 50, cornerRadius: 0 },
  'i-beam': { depth: 200, flangeWidth: 100, flangeThickness: 8, webThickness: 6, rootRadius: 10 },
  channel: { depth: 200, flangeWidth: 75, flangeThickness: 10, webThickness: 6, rootRadius: 10 },
  angle: { legVertical: 100, legHorizontal: 100, thickness: 10, rootRadius: 10 },
  tee: { depth: 100, flangeWidth: 100, flangeThickness: 10, stemThickness: 8, rootRadius: 8 },
  'rect-tube': { width: 100, height: 50, wall: 5, outerRadius: 10 },
  'round-tube': { outerDiameter: 100, wall: 5 },
  'bent-plate': { legHorizontal: 100, legVertical: 100, thickness: 5, insideRadius: 5 },
};

/** Largest accepted dimension or coordinate magnitude: keeps every later moment finite. */
export const PROFILE_MAX_SIZE = 1e12;
/** Smallest accepted non-zero dimension: keeps every later moment (up to size⁴) clear of underflow. */
export const PROFILE_MIN_SIZE = 1e-12;
/** A thickness or length may not be smaller than this fraction of the profile's largest dimension. */
export const PROFILE_MIN_RATIO = 1e-6;
/** The position may be at most this many times the largest dimension away from the origin. */
export const PROFILE_MAX_OFFSET_RATIO = 1e9;

// ---------------------------------------------------------------------------------------------
// Validation

function fmt(v: number): string {
  return String(Number(v.toPrecision(12)));
}

function describe(v: unknown): string {
  if (typeof v === 'number') return String(v);
  if (v === undefined) return 'nothing';
  if (v === null) return 'null';
  if (typeof v === 'string') return `the text ${JSON.stringify(v.length > 20 ? v.slice(0, 20) + '…' : v)}`;
  return `a value of type ${typeof v}`;
}

/**
 * Check that a profile's dimensions and placement make geometric sense. Returns an empty list
 * when the profile can be built; otherwise one entry per problem, naming the field.
 */
export function validateProfile(shape: ProfileShape): ProfileIssue[] {
  const issues: ProfileIssue[] = [];
  const s = shape as unknown as Record<string, unknown>;
  if (s === null || typeof s !== 'object') return [{ path: '', message: 'profile must be an object' }];

  const at = s.at;
  if (!Array.isArray(at) || at.length !== 2 || !at.every((v) => typeof v === 'number' && Number.isFinite(v)))
    issues.push({ path: 'at', message: 'position must be two finite numbers [x, y]' });
  else if (at.some((v: number) => Math.abs(v) > PROFILE_MAX_SIZE))
    issues.push({ path: 'at', message: `position [${at.map(fmt).join(', ')}] is too far out (limit ${PROFILE_MAX_SIZE})` });
  if (s.rotation !== undefined && !(typeof s.rotation === 'number' && Number.isFinite(s.rotation)))
    issues.push({ path: 'rotation', message: `rotation must be a finite number of degrees (got ${describe(s.rotation)})` });
  if (s.mirror !== undefined && typeof s.mirror !== 'boolean')
    issues.push({ path: 'mirror', message: `mirror must be true or false (got ${describe(s.mirror)})` });

  const type = s.type as ProfileType;
  const fields = (PROFILE_FIELDS as Record<string, readonly ProfileField<ProfileType>[] | undefined>)[type as string];
  if (!Object.prototype.hasOwnProperty.call(PROFILE_FIELDS, type as string) || !fields) {
    issues.push({ path: 'type', message: `unknown profile type ${describe(s.type)}` });
    return issues;
  }

  // Each field on its own: present, finite, positive (radii: not negative), not absurdly large.
  const placementIssues = issues.length;
  let fieldsOk = true;
  for (const f of fields) {
    const v = s[f.key];
    const name = f.label.toLowerCase();
    if (v === undefined && f.optional) continue;
    if (typeof v !== 'number' || !Number.isFinite(v)) {
      issues.push({ path: f.key, message: `${name} must be a finite number (got ${describe(v)})` });
      fieldsOk = false;
    } else if (f.allowZero ? v < 0 : v <= 0) {
      issues.push({ path: f.key, message: `${name} ${fmt(v)} must be ${f.allowZero ? 'zero or more' : 'greater than zero'}` });
      fieldsOk = false;
    } else if (v > PROFILE_MAX_SIZE) {
      issues.push({ path: f.key, message: `${name} ${fmt(v)} is too large (limit ${PROFILE_MAX_SIZE})` });
      fieldsOk = false;
    } else if (!f.allowZero && v < PROFILE_MIN_SIZE) {
      // (A radius below a billionth of the profile size is built as a sharp corner instead.)
      issues.push({ path: f.key, message: `${name} ${fmt(v)} is too small (at least ${PROFILE_MIN_SIZE})` });
      fieldsOk = false;
    }
  }
  if (!fieldsOk) return issues;

  // Sizes relative to each other and to the position: beyond these ratios double precision can
  // no longer tell the faces apart, and the area could come out as zero.
  const size = Math.max(...fields.map((f) => (s[f.key] as number | undefined) ?? 0));
  for (const f of fields) {
    const v = s[f.key] as number | undefined;
    if (f.allowZero || v === undefined || v >= PROFILE_MIN_RATIO * size) continue;
    issues.push({ path: f.key, message: `${f.label.toLowerCase()} ${fmt(v)} is too small next to the largest dimension ${fmt(size)} (at least a millionth of it)` });
  }
  const atOk = !issues.some((i) => i.path === 'at');
  if (atOk && Math.max(Math.abs((at as number[])[0]), Math.abs((at as number[])[1])) > PROFILE_MAX_OFFSET_RATIO * size)
    issues.push({ path: 'at', message: `position [${(at as number[]).map(fmt).join(', ')}] is too far from the origin for a profile this small (largest dimension ${fmt(size)})` });
  const sizeIssues = issues.length;
  if (issues.slice(placementIssues).some((i) => i.path !== 'at')) return issues;
  // Fields relative to each other: `less` demands a < limit, `atMost` a <= limit; the words
  // and the number name the limit, for a reader to check against the drawing. The number is
  // formatted only for a message: formatting the numbers of every valid profile was about a
  // quarter of the time spent building a rolled profile's outline.
  const p = shape;
  switch (p.type) {
    case 'rectangle': {
      const m = Math.min(p.width, p.height);
      atMost(issues, p.type, 'cornerRadius', p.cornerRadius ?? 0, m / 2, 'half the smaller side', m);
      break;
    }
    case 'i-beam':
    case 'channel': {
      const { depth: d, flangeWidth: b, flangeThickness: tf, webThickness: tw, rootRadius: r } = p;
      less(issues, p.type, 'flangeThickness', tf, d / 2, 'half the depth', d);
      less(issues, p.type, 'webThickness', tw, b, 'the flange width', b);
      if (issues.length > sizeIssues) break;
      if (p.type === 'i-beam') atMost(issues, p.type, 'rootRadius', r, (b - tw) / 2, 'the flange outstand (flange width − web thickness)/2 =', (b - tw) / 2);
      else atMost(issues, p.type, 'rootRadius', r, b - tw, 'the flange outstand (flange width − web thickness) =', b - tw);
      atMost(issues, p.type, 'rootRadius', r, (d - 2 * tf) / 2, 'half the clear web depth (depth − 2 × flange thickness)', d - 2 * tf);
      break;
    }
    case 'angle': {
      const { legVertical: lv, legHorizontal: lh, thickness: t, rootRadius: r } = p;
      less(issues, p.type, 'thickness', t, lh, 'the horizontal leg', lh);
      less(issues, p.type, 'thickness', t, lv, 'the vertical leg', lv);
      if (issues.length > sizeIssues) break;
      atMost(issues, p.type, 'rootRadius', r, lh - t, 'the horizontal leg less the thickness,', lh - t);
      atMost(issues, p.type, 'rootRadius', r, lv - t, 'the vertical leg less the thickness,', lv - t);
      break;
    }
    case 'tee': {
      const { depth: d, flangeWidth: b, flangeThickness: tf, stemThickness: ts, rootRadius: r } = p;
      less(issues, p.type, 'flangeThickness', tf, d, 'the depth', d);
      less(issues, p.type, 'stemThickness', ts, b, 'the flange width', b);
      if (issues.length > sizeIssues) break;
      atMost(issues, p.type, 'rootRadius', r, (b - ts) / 2, 'the flange outstand (flange width − stem thickness)/2 =', (b - ts) / 2);
      atMost(issues, p.type, 'rootRadius', r, d - tf, 'the clear stem length (depth − flange thickness)', d - tf);
      break;
    }
    case 'rect-tube': {
      const m = Math.min(p.width, p.height);
      less(issues, p.type, 'wall', p.wall, m / 2, 'half the smaller side', m);
      atMost(issues, p.type, 'outerRadius', p.outerRadius, m / 2, 'half the smaller side', m);
      break;
    }
    case 'round-tube': {
      less(issues, p.type, 'wall', p.wall, p.outerDiameter / 2, 'half the outside diameter', p.outerDiameter);
      break;
    }
    case 'bent-plate': {
      const { legHorizontal: lh, legVertical: lv, thickness: t, insideRadius: ri } = p;
      const ro = ri + t;
      const what = 'the outside bend radius (inside bend radius + thickness)';
      if (!(lh >= ro)) issues.push({ path: 'legHorizontal', message: `horizontal leg ${fmt(lh)} must be at least ${what} ${fmt(ro)}` });
      if (!(lv >= ro)) issues.push({ path: 'legVertical', message: `vertical leg ${fmt(lv)} must be at least ${what} ${fmt(ro)}` });
      break;
    }
  }
  return issues;
}

/** Field `path` must be less than `limit` (`words` and `value` name the limit in a message). */
function less(issues: ProfileIssue[], type: ProfileType, path: string, a: number, limit: number, words: string, value: number): void {
  if (!(a < limit)) issues.push({ path, message: `${label(type, path)} ${fmt(a)} must be less than ${words} ${fmt(value)}` });
}

/** Field `path` must be at most `limit`. */
function atMost(issues: ProfileIssue[], type: ProfileType, path: string, a: number, limit: number, words: string, value: number): void {
  if (!(a <= limit)) issues.push({ path, message: `${label(type, path)} ${fmt(a)} must be at most ${words} ${fmt(value)}` });
}

function label(type: ProfileType, key: string): string {
  const f = (PROFILE_FIELDS[type] as readonly ProfileField<ProfileType>[]).find((x) => x.key === key);
  return (f ? f.label : key).toLowerCase();
}
