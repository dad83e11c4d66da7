/**
 * Regions that tile the plane exactly. Two smooth functions of place (the
 * Moon-up margins at the start and at the end of a phase) split the globe
 * into up to four classes by their signs. Each grid cell is cut into two
 * triangles, in which both functions are taken as linear (the same linear
 * interpolation along grid edges as marching squares); each triangle is
 * clipped by the two zero lines into convex pieces, one per class. Every
 * point a piece uses is computed once, from the grid edge or the triangle it
 * lies on, and named by that edge or triangle, so neighbouring pieces share
 * their edges exactly. A region is the union of its pieces: edges walked in
 * both directions cancel, what is left is its boundary. So the regions
 * cover the lon/lat rectangle without gaps or overlaps, by construction.
 */
import type { Position } from 'geojson';
import { ringArea, regionContains, type GridShape, type PlanarMultiPolygon } from './regions.ts';

/** A class from the signs of the two functions (> 0 counts as positive); -1 leaves it out. */
export type ClassLabel = (firstPositive: boolean, secondPositive: boolean) => number;

interface Node {
  readonly key: number;
  readonly x: number;
  readonly y: number;
  readonly a: number;
  readonly b: number;
}

/** The line an edge of a piece lies on: a grid side (its id ≥ 0), or the zero line of a function inside the triangle. */
const ZERO_LINE_A = -1;
const ZERO_LINE_B = -2;

interface Piece {
  readonly nodes: Node[];
  /** lines[k]: the line from nodes[k] to nodes[k + 1]. */
  readonly lines: number[];
}

/**
 * Regions of every label, each as planar lon/lat polygons (outer rings
 * counter-clockwise, holes clockwise), from two functions sampled on the grid.
 */
export function tileRegions(grid: GridShape, first: ArrayLike<number>, second: ArrayLike<number>, label: ClassLabel, labels: number): PlanarMultiPolygon[] {
  const { columns, rows, resolutionDeg: res } = grid;
  const n = columns * rows;
  const cellColumns = columns - 1;
  const cellRows = rows - 1;
  // Sign classes 0–3 (first positive: 2, second positive: 1); a triangle is whole only when its corners share one (not merely a label).
  const classOf = (k: number) => (first[k]! > 0 ? 2 : 0) + (second[k]! > 0 ? 1 : 0);
  const labelOfClass = [label(false, false), label(false, true), label(true, false), label(true, true)];
  const vertex = (k: number): Node => {
    const i = k % columns;
    const j = (k - i) / columns;
    return { key: k, x: -180 + i * res, y: 90 - j * res, a: first[k]!, b: second[k]! };
  };
  // Sides: 0 horizontal (k, k+1), 1 vertical (k, k+columns), 2 diagonal (k, k+columns+1); id = type * n + k.
  const sideEnds = (side: number): [number, number] => {
    const type = Math.floor(side / n);
    const k = side - type * n;
    return [k, k + (type === 0 ? 1 : type === 1 ? columns : columns + 1)];
  };
  const points = new Map<number, Node>();
  /** Where function `which` (0: first, 1: second) is zero on a side: computed from the side's own ends only. */
  const sideCrossing = (side: number, which: 0 | 1): Node => {
    const key = n + (side * 2 + which);
    let node = points.get(key);
    if (!node) {
      const [p, q] = sideEnds(side).map(vertex) as [Node, Node];
      const vp = which === 0 ? p.a : p.b;
      const vq = which === 0 ? q.a : q.b;
      const t = vp / (vp - vq);
      node = { key, x: p.x + t * (q.x - p.x), y: p.y + t * (q.y - p.y), a: which === 0 ? 0 : p.a + t * (q.a - p.a), b: which === 1 ? 0 : p.b + t * (q.b - p.b) };
      points.set(key, node);
    }
    return node;
  };
  /** Where both zero lines meet inside a triangle: on the first one's line, from its two (canonically ordered) ends. */
  const meeting = (triangle: number, p: Node, q: Node): Node => {
    const key = n * 7 + triangle;
    let node = points.get(key);
    if (!node) {
      const [u, v] = p.key < q.key ? [p, q] : [q, p];
      const t = u.b / (u.b - v.b);
      node = { key, x: u.x + t * (v.x - u.x), y: u.y + t * (v.y - u.y), a: 0, b: 0 };
      points.set(key, node);
    }
    return node;
  };

  const clip = (piece: Piece, which: 0 | 1, positive: boolean, triangle: number): Piece => {
    const nodes: Node[] = [];
    const lines: number[] = [];
    const count = piece.nodes.length;
    const inside = (node: Node) => ((which === 0 ? node.a : node.b) > 0) === positive;
    for (let k = 0; k < count; k++) {
      const p = piece.nodes[k]!;
      const q = piece.nodes[(k + 1) % count]!;
      const line = piece.lines[k]!;
      const pIn = inside(p);
      const qIn = inside(q);
      if (pIn) {
        nodes.push(p);
        lines.push(line);
      }
      if (pIn !== qIn) {
        const cut = line >= 0 ? sideCrossing(line, which) : meeting(triangle, p, q);
        nodes.push(cut);
        // Leaving: the next edge runs along this function's zero line; entering: along the rest of the cut edge.
        lines.push(pIn ? (which === 0 ? ZERO_LINE_A : ZERO_LINE_B) : line);
      }
    }
    return { nodes, lines };
  };

  // Each triangle's label when all its corners share one sign class; -2 when it is cut.
  const triangleCount = cellColumns * cellRows * 2;
  const uniform = new Int32Array(triangleCount).fill(-2);
  for (let j = 0; j < cellRows; j++) {
    for (let i = 0; i < cellColumns; i++) {
      const k = j * columns + i;
      const ca = classOf(k);
      const cb = classOf(k + 1);
      const cc = classOf(k + columns + 1);
      const cd = classOf(k + columns);
      const cell = (j * cellColumns + i) * 2;
      if (ca === cc && cc === cb) uniform[cell] = labelOfClass[ca]!;
      if (ca === cd && cd === cc) uniform[cell + 1] = labelOfClass[ca]!;
    }
  }
  // Across each side of a triangle, the triangle on the other side (or -1 at the frame).
  const across = (triangle: number, side: number): number => {
    const cell = triangle >> 1;
    const i = cell % cellColumns;
    const j = (cell - i) / cellColumns;
    const type = Math.floor(side / n);
    if (type === 2) return triangle ^ 1;
    if (triangle % 2 === 0) {
      // (a, c, b): the vertical side on its right, the horizontal side on top.
      if (type === 1) return i + 1 < cellColumns ? (j * cellColumns + i + 1) * 2 + 1 : -1;
      return j > 0 ? ((j - 1) * cellColumns + i) * 2 + 1 : -1;
    }
    // (a, d, c): the vertical side on its left, the horizontal side at the bottom.
    if (type === 1) return i > 0 ? (j * cellColumns + i - 1) * 2 : -1;
    return j + 1 < cellRows ? ((j + 1) * cellColumns + i) * 2 : -1;
  };

  /** A whole triangle whose three neighbours are whole with the same label (none at the frame): all its sides cancel. */
  const isInterior = (triangle: number, whole: number): boolean => {
    const cell = triangle >> 1;
    const i = cell % cellColumns;
    const j = (cell - i) / cellColumns;
    if (uniform[triangle ^ 1] !== whole) return false;
    if (triangle % 2 === 0) {
      return i + 1 < cellColumns && j > 0 && uniform[(j * cellColumns + i + 1) * 2 + 1] === whole && uniform[((j - 1) * cellColumns + i) * 2 + 1] === whole;
    }
    return i > 0 && j + 1 < cellRows && uniform[(j * cellColumns + i - 1) * 2] === whole && uniform[((j + 1) * cellColumns + i) * 2] === whole;
  };

  const edges: Map<number, [number, number]>[] = Array.from({ length: labels }, () => new Map());
  const KEY_SPAN = n * 8;
  const addEdge = (target: number, from: number, to: number) => {
    const map = edges[target]!;
    const reverse = to * KEY_SPAN + from;
    if (map.has(reverse)) map.delete(reverse);
    else map.set(from * KEY_SPAN + to, [from, to]);
  };

  for (let j = 0; j < cellRows; j++) {
    for (let i = 0; i < cellColumns; i++) {
      const k = j * columns + i;
      const a = k;
      const b = k + 1;
      const c = k + columns + 1;
      const d = k + columns;
      const cell = (j * cellColumns + i) * 2;
      for (let half = 0; half < 2; half++) {
        const triangle = cell + half;
        const whole = uniform[triangle]!;
        // A whole triangle with no label, or one inside a region of its own label, adds nothing.
        if (whole === -1) continue;
        if (whole >= 0 && isInterior(triangle, whole)) continue;
        const corners = half === 0 ? [a, c, b] : [a, d, c];
        const sides = half === 0 ? [2 * n + k, 1 * n + (k + 1), 0 * n + k] : [1 * n + k, 0 * n + (k + columns), 2 * n + k];
        if (whole >= 0) {
          for (let s = 0; s < 3; s++) {
            const other = across(triangle, sides[s]!);
            if (other >= 0 && uniform[other] === whole) continue;
            addEdge(whole, corners[s]!, corners[(s + 1) % 3]!);
          }
          continue;
        }
        const start: Piece = { nodes: corners.map(vertex), lines: sides };
        for (const firstPositive of [true, false]) {
          const part = clip(start, 0, firstPositive, triangle);
          if (part.nodes.length < 3) continue;
          for (const secondPositive of [true, false]) {
            const target = label(firstPositive, secondPositive);
            if (target < 0) continue;
            const piece = clip(part, 1, secondPositive, triangle);
            if (piece.nodes.length < 3) continue;
            for (let s = 0; s < piece.nodes.length; s++) addEdge(target, piece.nodes[s]!.key, piece.nodes[(s + 1) % piece.nodes.length]!.key);
          }
        }
      }
    }
  }

  const position = (key: number): Position => {
    if (key < n) {
      const v = vertex(key);
      return [v.x, v.y];
    }
    const node = points.get(key)!;
    return [node.x, node.y];
  };
  return edges.map((map) => assemble(map, position));
}

/** Boundary edges → rings (at a pinch, the sharpest right turn keeps rings apart) → polygons with their holes. */
function assemble(edges: Map<number, [number, number]>, position: (key: number) => Position): PlanarMultiPolygon {
  const outgoing = new Map<number, number[]>();
  for (const [from, to] of edges.values()) {
    const list = outgoing.get(from);
    if (list) list.push(to);
    else outgoing.set(from, [to]);
  }
  const rings: Position[][] = [];
  const starts = [...outgoing.keys()].sort((p, q) => p - q);
  for (const first of starts) {
    while ((outgoing.get(first)?.length ?? 0) > 0) {
      const keys = [first];
      let previous = first;
      let current = takeNext(outgoing, first, undefined, position);
      while (current !== first) {
        keys.push(current);
        const next = takeNext(outgoing, current, previous, position);
        previous = current;
        current = next;
      }
      const ring = simplify(keys.map(position));
      if (ring.length >= 4 && ringArea(ring) !== 0) rings.push(ring);
    }
  }
  const outers = rings.filter((r) => ringArea(r) > 0).sort((p, q) => ringArea(p) - ringArea(q));
  const holes = rings.filter((r) => ringArea(r) < 0);
  const polygons = outers.map((outer) => [outer]);
  for (const hole of holes) {
    const probe = interiorProbe(hole);
    const owner = outers.findIndex((outer) => regionContains([[outer]], probe));
    if (owner >= 0) polygons[owner]!.push(hole);
  }
  // Largest first, as a reader of the file would expect.
  return polygons.reverse();
}

function takeNext(outgoing: Map<number, number[]>, at: number, from: number | undefined, position: (key: number) => Position): number {
  const list = outgoing.get(at)!;
  let index = 0;
  if (list.length > 1 && from !== undefined) {
    const [x, y] = position(at) as [number, number];
    const [fx, fy] = position(from) as [number, number];
    const back = Math.atan2(fy - y, fx - x);
    let best = Infinity;
    list.forEach((to, k) => {
      const [tx, ty] = position(to) as [number, number];
      let turn = back - Math.atan2(ty - y, tx - x);
      while (turn <= 0) turn += 2 * Math.PI;
      while (turn > 2 * Math.PI) turn -= 2 * Math.PI;
      if (turn < best) {
        best = turn;
        index = k;
      }
    });
  }
  const [next] = list.splice(index, 1);
  return next!;
}

/** Closed ring without repeated points or points in the middle of a straight frame or grid line. */
function simplify(points: Position[]): Position[] {
  const out: Position[] = [];
  for (const p of points) {
    const last = out[out.length - 1];
    if (!last || last[0] !== p[0] || last[1] !== p[1]) out.push(p);
  }
  while (out.length > 1 && out[0]![0] === out[out.length - 1]![0] && out[0]![1] === out[out.length - 1]![1]) out.pop();
  const kept = out.filter((p, k) => {
    const before = out[(k - 1 + out.length) % out.length]!;
    const after = out[(k + 1) % out.length]!;
    return !((before[0] === p[0] && p[0] === after[0]) || (before[1] === p[1] && p[1] === after[1]));
  });
  return kept.length >= 3 ? [...kept, kept[0]!] : [];
}

/** A point just inside a hole's boundary (to its interior side: left of a clockwise ring is outside the hole, so step right). */
function interiorProbe(ring: Position[]): [number, number] {
  const [x0, y0] = ring[0] as [number, number];
  const [x1, y1] = ring[1] as [number, number];
  return [(x0 + x1) / 2, (y0 + y1) / 2];
}
