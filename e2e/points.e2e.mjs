/**
 * Vertex and segment editing in the side panel: insert and delete polygon vertices, split and
 * delete path points, switch a path segment between line and arc. Each click is one undo step;
 * areas are checked against closed forms named beside each check.
 */
import assert from 'node:assert/strict';
import { close, doc, docShapes, open, prop, setField, settle } from './helpers.mjs';

const PI = Math.PI;

/** Shoelace formula for the area of a simple polygon (Gere & Goodno, App. E; shoelace formula). */
function shoelace(p) {
  let s = 0;
  for (let i = 0; i < p.length; i++) {
    const [x0, y0] = p[i], [x1, y1] = p[(i + 1) % p.length];
    s += x0 * y1 - x1 * y0;
  }
  return Math.abs(s) / 2;
}

async function selectInList(page, id) {
  await page.click(`[data-shape="${id}"]`);
  await settle(page);
}
async function click(page, testid) {
  await page.click(`[data-testid="selection-panel"] [data-testid="${testid}"]`);
  await settle(page);
}
const pastLength = (page) => page.evaluate(() => window.__kern.editor.store.getState().past.length);
async function undo(page) {
  await page.click('[data-command="undo"]');
  await settle(page);
}

const rect = doc([{ id: 'p', type: 'polygon', points: [[0, 0], [100, 0], [100, 60], [0, 60]] }]);
const a = 100;
const square = doc([{ id: 'q', type: 'path', start: [0, 0], segments: [{ to: [a, 0] }, { to: [a, a] }, { to: [0, a] }, { to: [0, 0] }] }]);

export const tests = [
  {
    name: 'point editing: insert and delete polygon vertices, one undo step each',
    async run(t) {
      const { page, errors } = await open(t, { seed: rect });
      await selectInList(page, 'p');
      close(await prop(page, 'area'), 6000, 'A = b·h (Gere & Goodno, App. E, rectangle)');

      await click(page, 'vertex-insert-0');
      let pts = (await docShapes(page))[0].points;
      assert.deepEqual(pts, [[0, 0], [50, 0], [100, 0], [100, 60], [0, 60]], 'new vertex at the midpoint of edge 1–2');
      assert.equal(await pastLength(page), 1, 'one undo step');
      close(await prop(page, 'area'), shoelace(pts), 'shoelace area of the five points (Gere & Goodno, App. E; shoelace formula)');

      // Pull the new vertex down: the outline gains the triangle (0,0) (50,−20) (100,0).
      await setField(page, 'points[1].y', '-20');
      pts = (await docShapes(page))[0].points;
      const a2 = shoelace(pts);
      close(a2, 6000 + (100 * 20) / 2, 'the shoelace value is the rectangle plus b·t/2 (Gere & Goodno, App. E, triangle)');
      close(await prop(page, 'area'), a2, 'shoelace area after the move (Gere & Goodno, App. E; shoelace formula)');

      await click(page, 'vertex-delete-3'); // (100, 60)
      pts = (await docShapes(page))[0].points;
      assert.deepEqual(pts, [[0, 0], [50, -20], [100, 0], [0, 60]]);
      close(await prop(page, 'area'), shoelace(pts), 'shoelace area after the delete (Gere & Goodno, App. E; shoelace formula)');
      assert.equal(await pastLength(page), 3);

      await undo(page);
      close(await prop(page, 'area'), a2, 'undo restores the area before the delete');
      assert.equal((await docShapes(page))[0].points.length, 5);
      await undo(page);
      await undo(page);
      close(await prop(page, 'area'), 6000, 'back to the rectangle');
      assert.deepEqual((await docShapes(page))[0].points, rect.shapes[0].points);
      assert.deepEqual(errors, []);
    },
  },
  {
    name: 'point editing: deleting below 3 vertices is refused with a message',
    async run(t) {
      const tri = doc([{ id: 't', type: 'polygon', points: [[0, 0], [40, 0], [0, 30]] }]);
      const { page } = await open(t, { seed: tri });
      await selectInList(page, 't');
      close(await prop(page, 'area'), 600, 'A = b·h/2 (Gere & Goodno, App. E, triangle)');
      const before = await docShapes(page);
      await click(page, 'vertex-delete-1');
      const msg = await page.textContent('[data-testid="selection-panel"] [data-error-for="points[1]"]');
      assert.match(msg, /shapes\[0\]\.points\[1\]/, 'the message says where');
      assert.match(msg, /at least 3 vertices/, 'the message says what is wrong');
      assert.equal(await page.getAttribute('[data-error-for="points[1]"]', 'role'), 'alert');
      assert.deepEqual(await docShapes(page), before, 'the triangle is unchanged');
      assert.equal(await pastLength(page), 0, 'nothing recorded');
      close(await prop(page, 'area'), 600, 'area unchanged');
      // A later edit that works clears the message.
      await click(page, 'vertex-insert-2');
      assert.equal(await page.$('[data-error-for="points[1]"]'), null);
      close(await prop(page, 'area'), 600, 'a point on an edge adds no area');
    },
  },
  {
    name: 'point editing: a square side becomes an arc, then a semicircle; undo and make line restore',
    async run(t) {
      const { page } = await open(t, { seed: square });
      await selectInList(page, 'q');
      close(await prop(page, 'area'), a * a, 'A = a² (Gere & Goodno, App. E, square)');

      await click(page, 'segment-arc-0');
      const g = (await docShapes(page))[0].segments[0];
      assert.deepEqual(g, { to: [a, 0], via: [a / 2, a / 4] }, 'via on the bisector, a quarter chord left of travel');
      // Chord a, sagitta a/4: R = 5a/8, half angle α with sin α = 4/5; the circular segment
      // A = R²(α − sin α cos α) (Gere & Goodno, App. E, circular segment) is cut off the inside.
      const R = (5 * a) / 8, al = Math.asin(4 / 5);
      const inward = a * a - R * R * (al - Math.sin(al) * Math.cos(al));
      close(await prop(page, 'area'), inward, 'a² minus the circular segment');

      // Put the via on the far side at a/2 from the chord: a semicircle on the side.
      await setField(page, 'segments[0].via.y', String(-a / 2));
      close(await prop(page, 'area'), a * a + (PI * a * a) / 8, 'a² + πa²/8: square plus a semicircle of radius a/2 (Gere & Goodno, App. E, semicircle)');
      assert.equal(await pastLength(page), 2);

      await undo(page);
      close(await prop(page, 'area'), inward, 'undo restores the quarter-chord arc');
      await undo(page);
      close(await prop(page, 'area'), a * a, 'undo restores the square');

      await page.click('[data-command="redo"]');
      await page.click('[data-command="redo"]');
      close(await prop(page, 'area'), a * a + (PI * a * a) / 8, 'redo brings the semicircle back');
      await click(page, 'segment-line-0');
      assert.deepEqual((await docShapes(page))[0], square.shapes[0], 'the via point is dropped');
      close(await prop(page, 'area'), a * a, 'A = a² again');
    },
  },
  {
    name: 'point editing: split an arc on its circle, delete the start point, refuse a too-short path',
    async run(t) {
      const r = 40;
      // Semicircle above the diameter from (r, 0) to (−r, 0).
      const semi = doc([{ id: 's', type: 'path', start: [r, 0], segments: [{ to: [-r, 0], via: [0, r] }, { to: [r, 0] }] }]);
      const { page } = await open(t, { seed: semi });
      await selectInList(page, 's');
      const half = (PI * r * r) / 2;
      close(await prop(page, 'area'), half, 'A = πr²/2 (Gere & Goodno, App. E, semicircle)');

      // Two segments: deleting either point would leave one.
      await click(page, 'point-delete-0');
      assert.match(await page.textContent('[data-error-for="start"]'), /at least 2 segments/);
      assert.equal(await pastLength(page), 0);

      await click(page, 'segment-split-0');
      let s = (await docShapes(page))[0];
      assert.equal(s.segments.length, 3);
      assert.deepEqual(s.segments[0].to, [0, r], 'split at the old via point');
      for (const k of [0, 1]) close(Math.hypot(...s.segments[k].via), r, `via ${k + 1} on the circle of radius r`, 1e-14);
      close(await prop(page, 'area'), half, 'same circle, same area: πr²/2');
      close(await prop(page, 'Ix'), (PI / 8 - 8 / (9 * PI)) * r ** 4, 'Ix about the centroid = (π/8 − 8/(9π))r⁴ (Gere & Goodno, App. E, semicircle)', 1e-9);

      // Delete the start (r, 0): the start moves to the next point, the top of the circle.
      await click(page, 'point-delete-0');
      s = (await docShapes(page))[0];
      assert.deepEqual(s.start, [0, r]);
      assert.deepEqual(s.segments[s.segments.length - 1].to, s.start, 'the path stays closed');
      // Left: the quarter circle from (0, r) to (−r, 0), closed by the chord back to (0, r) through
      // the merged line: a quarter circle minus its triangle, πr²/4 − r²/2 (Gere & Goodno, App. E).
      close(await prop(page, 'area'), (PI * r * r) / 4 - (r * r) / 2, 'circular segment of 90°: r²(π/2 − 1)/2');
      await undo(page);
      close(await prop(page, 'area'), half, 'undo restores the semicircle');
    },
  },
];
