package org.trundle.surfaces;

import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.internal.Checks;
import org.trundle.core.Patch;

/**
 * Scenes of tubes built from several patches.
 */
public final class Tubes {
    private Tubes() {
    }

    /**
     * A straight bore ending in a rounded mouth: the inside of a cylinder of radius {@code R} from
     * {@code −length} to 0 along {@code axis} (measured from {@code mouth}), joined at the mouth to a
     * torus lip of radius {@code ρ} that turns the wall outward through a quarter turn. The lip is the
     * outside of a torus with centre {@code mouth}, axis {@code axis}, major radius {@code R + ρ} and
     * minor radius {@code ρ}, bounded to tube angles from {@code π/2} (the top of the lip, facing along
     * the axis) to {@code π} (its inner equator, the circle of radius {@code R} at the mouth). At the
     * join both the point and the normal (toward the axis) agree, so the wall is tangent-continuous
     * and a ball rolling out of the bore is handed over to the lip (the principal curvature along the
     * axis jumps from 0 to {@code 1/ρ} there; common practice for a radiused edge).
     *
     * <p>Patch ids: {@code id + ".tube"} and {@code id + ".lip"}. Edge names: the tube's {@code from}
     * (its closed-off far end) and {@code to} (the mouth, joined to the lip); the lip's {@code tubeTo}
     * (the join) and {@code tubeFrom} (the outer rim, where a ball leaves over the lip).
     *
     * @param id prefix of the patch ids
     * @param mouth centre of the mouth (m)
     * @param axis direction out of the mouth (any length, not zero)
     * @param radius bore radius R (m)
     * @param length bore length (m)
     * @param lipRadius lip radius ρ (m)
     * @return the two patches, bore first
     */
    public static List<Patch> withRoundedMouth(String id, Vector3D mouth, Vector3D axis, double radius,
                                               double length, double lipRadius) {
        Checks.finite("mouth", mouth);
        Vector3D a = Checks.direction("axis", axis);
        Checks.positive("radius", radius);
        Checks.positive("length", length);
        Checks.positive("lipRadius", lipRadius);
        Cylinder bore = new Cylinder(mouth, a, radius, Side.INSIDE, -length, 0.0);
        Torus lip = new Torus(mouth, a, null, radius + lipRadius, lipRadius, Side.OUTSIDE, -Math.PI, Math.PI,
            0.5 * Math.PI, Math.PI);
        return List.of(Patch.of(id + ".tube", bore), Patch.of(id + ".lip", lip));
    }
}
