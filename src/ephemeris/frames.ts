/**
 * Reference frames: the J2000 mean equator (EQJ) of the ephemeris turned to
 * the true equator and equinox of date (EQD), by astronomy-engine's
 * precession and nutation (IAU 2006 precession, IAU 2000B nutation). Every
 * computation that needs a position of date goes through here.
 */
import { RotateVector, Rotation_EQJ_EQD, Vector, type AstroTime, type RotationMatrix } from 'astronomy-engine';
import type { Vec3 } from './vector.ts';

/** The EQJ → EQD rotation at a time; worth keeping when several positions share one instant. */
export function equatorOfDateRotation(time: AstroTime): RotationMatrix {
  return Rotation_EQJ_EQD(time);
}

/** A geocentric EQJ position (any length unit) on the true equator and equinox of date, same unit. */
export function toEquatorOfDate(positionEQJ: Vec3, time: AstroTime, rotation: RotationMatrix = Rotation_EQJ_EQD(time)): Vec3 {
  const v = RotateVector(rotation, new Vector(positionEQJ[0], positionEQJ[1], positionEQJ[2], time));
  return [v.x, v.y, v.z];
}
