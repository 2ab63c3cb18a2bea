/**
 * Validation of one shape record: the fields every shape has (id, name, op, type), then its
 * kind's own fields. Every problem comes back with its path (`shapes[3].radius`).
 */
import { OPS } from './base';
import { fmtValue as fmtNum, isObj, type Issue } from './check';
import { isShapeType, SHAPE_KINDS, SHAPE_TYPES } from './registry';

/** Validate one shape record. `path` is its location, e.g. 'shapes[3]'. */
export function validateShape(s: unknown, path: string): Issue[] {
  const out: Issue[] = [];
  if (!isObj(s)) return [{ path, message: 'a shape must be an object' }];
  if (typeof s.id !== 'string' || s.id.trim() === '') out.push({ path: `${path}.id`, message: 'every shape needs a non-empty string id' });
  if (s.name !== undefined && typeof s.name !== 'string') out.push({ path: `${path}.name`, message: 'name must be text' });
  if (s.material !== undefined && (typeof s.material !== 'string' || s.material.trim() === '')) out.push({ path: `${path}.material`, message: 'material must be the id of a material of the document' });
  if (s.op !== undefined && !(OPS as readonly unknown[]).includes(s.op)) {
    out.push({ path: `${path}.op`, message: `unknown operation ${fmtNum(s.op)}; use one of ${OPS.join(', ')}` });
  }
  if (!isShapeType(s.type)) {
    out.push({ path: `${path}.type`, message: `unknown shape type ${fmtNum(s.type)}; use one of ${SHAPE_TYPES.join(', ')}` });
    return out;
  }
  SHAPE_KINDS[s.type].validate(s, path, out);
  return out;
}
