package org.trundle.core;

import org.hipparchus.geometry.euclidean.threed.Vector3D;

/**
 * One contact of a {@link Sample}: which patch the ball touches, in which mode, and the force that patch
 * puts on the ball there. A ball touching two walls at once (a V-groove, two rails) gives two of these per
 * sample; the loads each wall sees (contact force, Hertz patch) are computed from them one wall at a time.
 *
 * <p>The contact force on the ball is {@code F = N n + F_t}: the normal force {@code N} (N) along the unit
 * normal {@code n} (pointing from the wall to the ball's centre) and the tangential friction force
 * {@code F_t} (N, world frame, perpendicular to {@code n}). The contact point is {@code p = c − r n} (m).
 * The mode is {@link Phase#ROLLING} or {@link Phase#SLIDING} for a rigid contact ({@link Phase#REST} in the
 * closing sample of a ball at rest); a compliant contact pressing the wall while the ball is integrated as
 * in flight reports {@link Phase#FLIGHT}, the phase of its sample ({@link #compliant()} is then true and files
 * name the mode {@code compliant}, {@link #modeLabel()}).
 *
 * @param patch id of the touched patch ({@link Patch#id()})
 * @param mode the contact's mode
 * @param normalForce normal force N (N), positive when the wall pushes
 * @param frictionForce tangential contact force on the ball F_t (N), world frame
 * @param contactPoint contact point p = c − r n (m)
 * @param normal unit normal n at the contact, toward the ball's centre
 */
public record SampleContact(String patch, Phase mode, double normalForce, Vector3D frictionForce,
                            Vector3D contactPoint, Vector3D normal) {
    /** Checks that every part is given. */
    public SampleContact {
        if (patch == null || mode == null || frictionForce == null || contactPoint == null || normal == null) {
            throw new IllegalArgumentException("a sample contact needs patch, mode, friction force, contact point and"
                + " normal, got " + patch + ", " + mode + ", " + frictionForce + ", " + contactPoint + ", " + normal);
        }
    }

    /**
     * @return whether this is a compliant contact: only a compliant patch pressed by the ball reports the mode
     *     {@link Phase#FLIGHT} (its force comes from the approach, not from a constraint; the ball may at the same
     *     time roll or slide on a rigid patch, whose contact reports that mode)
     */
    public boolean compliant() {
        return mode == Phase.FLIGHT;
    }

    /**
     * @return the contact's mode as written in files: {@code compliant} for a compliant contact, else the
     *     mode's {@link Phase#label()} ({@code rolling}, {@code sliding}, {@code rest})
     */
    public String modeLabel() {
        return compliant() ? "compliant" : mode.label();
    }
}
