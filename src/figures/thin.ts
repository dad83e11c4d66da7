/**
 * Thinning projected lines to what a picture can show: a d3-geo stream
 * transform, placed after the projection (and its clipping and resampling)
 * and before the path builder. A point closer than the tolerance to the last
 * point kept is dropped; the first and last point of every line and ring are
 * always kept, so lines end where they did and rings close where they did.
 */
import type { GeoStream, GeoStreamWrapper } from 'd3-geo';

/** The projection's stream, thinned to `tolerancePx` (pixels of the output). */
export function thinnedProjection(projection: GeoStreamWrapper, tolerancePx: number): GeoStreamWrapper {
  const tolerance2 = tolerancePx * tolerancePx;
  return { stream: (sink) => projection.stream(thinning(sink, tolerance2)) };
}

function thinning(sink: GeoStream, tolerance2: number): GeoStream {
  let inLine = false;
  let started = false;
  let keptX = 0;
  let keptY = 0;
  let held = false;
  let heldX = 0;
  let heldY = 0;
  return {
    point(x, y) {
      if (!inLine) return sink.point(x, y);
      if (started) {
        const dx = x - keptX;
        const dy = y - keptY;
        if (dx * dx + dy * dy < tolerance2) {
          held = true;
          heldX = x;
          heldY = y;
          return;
        }
      }
      started = true;
      held = false;
      keptX = x;
      keptY = y;
      sink.point(x, y);
    },
    lineStart() {
      inLine = true;
      started = false;
      held = false;
      sink.lineStart();
    },
    lineEnd() {
      if (held) sink.point(heldX, heldY);
      inLine = false;
      held = false;
      sink.lineEnd();
    },
    polygonStart: () => sink.polygonStart(),
    polygonEnd: () => sink.polygonEnd(),
    sphere: () => sink.sphere?.(),
  };
}
