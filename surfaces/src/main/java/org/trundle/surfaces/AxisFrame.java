package org.trundle.surfaces;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.internal.Checks;
import org.trundle.core.SurfaceCoordinate;

/**
 * An orthonormal frame about an axis {@code a}: the reference direction {@code c} of azimuth 0
 * (normal to {@code a}) and {@code b = a × c}, so that the azimuth of a direction {@code w} is
 * {@code φ = atan2(w·b, w·c)} in {@code (−π, π]}, increasing right-handed about {@code a}.
 *
 * <p>Default reference (when the user gives none), chosen so that a horizontal tube's angle 0 is
 * at the bottom: world down {@code −e_z} projected normal to the axis, when the axis is at least
 * about 5.7° from vertical (the projection is at least 0.1 long); otherwise {@code +e_x}
 * projected. Immutable; package-private.
 */
final class AxisFrame {
    /** The azimuth coordinate of an axisymmetric surface with the default reference. */
    static final SurfaceCoordinate AZIMUTH = new SurfaceCoordinate("azimuth", "rad",
        "angle round the axis in (-pi, pi], right-handed, from the default reference (down, or +x for a vertical axis)");

    final double ax;
    final double ay;
    final double az;
    final double cx;
    final double cy;
    final double cz;
    final double bx;
    final double by;
    final double bz;

    /**
     * @param axis unit axis
     * @param reference direction of azimuth 0 (projected normal to the axis; any length), or null
     *     for the default
     * @param what the reference's name in messages
     */
    AxisFrame(Vector3D axis, Vector3D reference, String what) {
        Vector3D c;
        if (reference == null) {
            c = project(Vector3D.MINUS_K, axis);
            if (!(c.getNorm() >= 0.1)) {
                c = project(Vector3D.PLUS_I, axis);
            }
        } else {
            Vector3D r = Checks.direction(what, reference);
            c = project(r, axis);
            if (!(c.getNorm() > 1e-9)) {
                throw new IllegalArgumentException(what + " must not be parallel to the axis " + axis + ", got " + reference);
            }
        }
        c = c.normalize();
        Vector3D b = Vector3D.crossProduct(axis, c);
        ax = axis.getX();
        ay = axis.getY();
        az = axis.getZ();
        cx = c.getX();
        cy = c.getY();
        cz = c.getZ();
        bx = b.getX();
        by = b.getY();
        bz = b.getZ();
    }

    private static Vector3D project(Vector3D r, Vector3D axis) {
        return r.subtract(r.dotProduct(axis), axis);
    }

    /** @return the unit reference direction c (azimuth 0) */
    Vector3D reference() {
        return new Vector3D(cx, cy, cz);
    }

    /**
     * @return the azimuth {@code atan2(w·b, w·c)} (rad) of the vector {@code (wx, wy, wz)}
     * @param wx x component
     * @param wy y component
     * @param wz z component
     */
    double azimuth(double wx, double wy, double wz) {
        return Math.atan2(wx * bx + wy * by + wz * bz, wx * cx + wy * cy + wz * cz);
    }

    /**
     * Writes {@code o + s a + ρ (cos φ c + sin φ b)} to {@code out}.
     *
     * @param ox origin x (m)
     * @param oy origin y (m)
     * @param oz origin z (m)
     * @param s axial offset (m)
     * @param rho radial offset (m)
     * @param phi azimuth (rad)
     * @param out receives the point
     */
    void point(double ox, double oy, double oz, double s, double rho, double phi, double[] out) {
        double c = rho * Math.cos(phi);
        double sn = rho * Math.sin(phi);
        out[0] = ox + s * ax + c * cx + sn * bx;
        out[1] = oy + s * ay + c * cy + sn * by;
        out[2] = oz + s * az + c * cz + sn * bz;
    }
}
