package org.trundle.surfaces;

import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.internal.Checks;
import org.trundle.core.Surface;

/**
 * The inner and outer raceways of a radial (deep-groove) ball bearing, from the usual dimensions: pitch
 * diameter {@code d_m}, ball diameter {@code D}, inner and outer groove conformities {@code f_i, f_o}
 * (groove radius over ball diameter, {@code > 1/2}), diametral clearance {@code P_d} (default zero) and zero
 * contact angle.
 *
 * <p>Geometry (common practice for a deep-groove bearing): each groove is a torus about the bearing axis
 * with the ball inside its tube. The inner groove bottom lies at radius {@code (d_m − D)/2 − P_d/4}, the outer at
 * {@code (d_m + D)/2 + P_d/4}, so that the outer groove's bottom diameter less the inner's less two ball diameters
 * is {@code P_d} (the diametral clearance) and a ball on the pitch circle has {@code P_d/4} of play toward each
 * race ({@code P_d/2} in all). The inner groove's curvature centres lie on the circle of radius
 * {@code R_i = (d_m − D)/2 − P_d/4 + f_i D}, tube radius {@code f_i D}; the outer groove's on
 * {@code R_o = (d_m + D)/2 + P_d/4 − f_o D}, tube radius {@code f_o D}. With zero clearance a ball whose centre lies
 * on the pitch circle touches both groove bottoms.
 * The tori are not bounded in tube angle (the shoulders are left to the scene); either ring may be given a
 * rotation about the axis as a patch motion.
 *
 * <p>Immutable and thread-safe.
 */
public final class BearingRaces {
    private final Vector3D centre;
    private final Vector3D axis;
    private final double pitchDiameter;
    private final double ballDiameter;
    private final double clearance;
    private final Torus inner;
    private final Torus outer;

    /**
     * Races with zero clearance.
     *
     * @param centre bearing centre (m)
     * @param axis bearing axis (any length, not zero)
     * @param pitchDiameter pitch diameter d_m (m), larger than the ball diameter
     * @param ballDiameter ball diameter D (m), positive
     * @param innerConformity inner groove radius over ball diameter f_i, in (1/2, 1)
     * @param outerConformity outer groove radius over ball diameter f_o, in (1/2, 1)
     */
    public BearingRaces(Vector3D centre, Vector3D axis, double pitchDiameter, double ballDiameter,
                        double innerConformity, double outerConformity) {
        this(centre, axis, pitchDiameter, ballDiameter, innerConformity, outerConformity, 0.0);
    }

    /**
     * @param centre bearing centre (m)
     * @param axis bearing axis (any length, not zero)
     * @param pitchDiameter pitch diameter d_m (m), larger than the ball diameter
     * @param ballDiameter ball diameter D (m), positive
     * @param innerConformity inner groove radius over ball diameter f_i, in (1/2, 1)
     * @param outerConformity outer groove radius over ball diameter f_o, in (1/2, 1)
     * @param clearance diametral clearance P_d (m), ≥ 0 and below the ball diameter
     */
    public BearingRaces(Vector3D centre, Vector3D axis, double pitchDiameter, double ballDiameter,
                        double innerConformity, double outerConformity, double clearance) {
        this.centre = Checks.finite("centre", centre);
        this.axis = Checks.direction("axis", axis);
        this.ballDiameter = Checks.positive("ball diameter", ballDiameter);
        if (!(pitchDiameter > 2 * ballDiameter)) {
            throw new IllegalArgumentException("bearing pitch diameter must exceed twice the ball diameter "
                + ballDiameter + " m (the inner ring needs a bore), got " + pitchDiameter);
        }
        if (!(clearance >= 0 && clearance < ballDiameter)) {
            throw new IllegalArgumentException("bearing diametral clearance must lie in [0, ball diameter "
                + ballDiameter + " m), got " + clearance);
        }
        this.pitchDiameter = pitchDiameter;
        this.clearance = clearance;
        conformity("inner conformity", innerConformity);
        conformity("outer conformity", outerConformity);
        double fi = innerConformity * ballDiameter;
        double fo = outerConformity * ballDiameter;
        double q = clearance / 4;
        this.inner = new Torus(centre, axis, pitchDiameter / 2 - ballDiameter / 2 - q + fi, fi, Side.INSIDE);
        this.outer = new Torus(centre, axis, pitchDiameter / 2 + ballDiameter / 2 + q - fo, fo, Side.INSIDE);
    }

    /** @return the diametral clearance P_d (m) */
    public double clearance() {
        return clearance;
    }

    private static void conformity(String name, double f) {
        if (!(f > 0.5 && f < 1)) {
            throw new IllegalArgumentException("bearing " + name + " must lie in (0.5, 1), got " + f);
        }
    }

    /** @return the inner raceway */
    public Torus innerRace() {
        return inner;
    }

    /** @return the outer raceway */
    public Torus outerRace() {
        return outer;
    }

    /** @return both raceways, the inner first */
    public List<Surface> races() {
        return List.of(inner, outer);
    }

    /**
     * A ball centre on the pitch circle.
     *
     * @param radial unit radial direction from the bearing axis (its part perpendicular to the axis is used)
     * @return the centre (m)
     */
    public Vector3D ballCentre(Vector3D radial) {
        Vector3D rr = Checks.finite("radial", radial);
        Vector3D perp = rr.subtract(axis.scalarMultiply(rr.dotProduct(axis)));
        if (!(perp.getNorm() > 1e-9 * rr.getNorm())) {
            throw new IllegalArgumentException("radial direction must not be parallel to the bearing axis, got " + radial);
        }
        return new Vector3D(1, centre, pitchDiameter / 2, perp.normalize());
    }

    /** @return the ball radius D/2 (m) these raceways hold */
    public double ballRadius() {
        return ballDiameter / 2;
    }

    /**
     * The orbit (cage) speed of a ball rolling without slip on both raceways at zero contact angle,
     * {@code ω_cage = ½ (ω_i (1 − D/d_m) + ω_o (1 + D/d_m))} (rolling-bearing kinematics; T. A. Harris,
     * Rolling Bearing Analysis, ch. on bearing kinematics; common practice).
     *
     * @param innerSpeed inner ring speed ω_i (rad/s)
     * @param outerSpeed outer ring speed ω_o (rad/s)
     * @return the cage (ball orbit) speed (rad/s)
     */
    public double cageSpeed(double innerSpeed, double outerSpeed) {
        double g = ballDiameter / pitchDiameter;
        return 0.5 * (Checks.finite("inner speed", innerSpeed) * (1 - g) + Checks.finite("outer speed", outerSpeed) * (1 + g));
    }
}
