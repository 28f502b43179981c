package org.trundle.surfaces;

import java.util.SplittableRandom;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

/** Seeded random helpers for the geometry tests. */
final class GeometryAssertionsSupport {
    private GeometryAssertionsSupport() {
    }

    static Vector3D randomUnit(SplittableRandom rnd) {
        double z = rnd.nextDouble(-1, 1);
        double phi = rnd.nextDouble(0, 2 * Math.PI);
        double s = Math.sqrt(1 - z * z);
        return new Vector3D(s * Math.cos(phi), s * Math.sin(phi), z);
    }
}
