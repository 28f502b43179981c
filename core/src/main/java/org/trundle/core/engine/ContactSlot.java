package org.trundle.core.engine;

import org.trundle.core.ContactContext;
import org.trundle.core.ContactGeometry;
import org.trundle.core.ContactLaw;
import org.trundle.core.Patch;
import org.trundle.core.SurfaceDomainException;
import org.trundle.core.MotionState;
import org.trundle.core.Surface;
import org.trundle.core.SurfaceMotion;

/**
 * One entry of the {@link ContactSet}: a patch the ball may touch (its surface and rigid motion),
 * its contact law, its mode and its own workspaces (geometry, law context, pose). Each slot owns
 * its workspaces, so a second contact (issue 12) is a second slot, not a second set of engine
 * fields.
 */
final class ContactSlot {
    /** Index of the patch in the scene. */
    final int index;
    /** The patch's id. */
    final String id;
    /** The patch's id as the one-element contact list of a sample. */
    final java.util.List<String> contactIds;
    /** The patch's surface at its rest pose. */
    final Surface surface;
    /** The patch's motion. */
    final SurfaceMotion motion;
    /** Whether the patch moves (false: every motion term is skipped). */
    final boolean moving;
    /** The patch's contact law. */
    final ContactLaw law;
    /** Whether the law adds couples ({@link ContactLaw#addsCouples()}), asked once. */
    final boolean couples;
    /**
     * Whether the law's couple about the normal is set-valued at zero relative normal spin
     * ({@link ContactLaw#hasPivotStick()}), the law adds couples and the patch stands still; asked once.
     * Without it the pivoting stick costs nothing. On a moving patch the hold is not taken (the
     * law's regularised couple acts on the relative spin instead; see {@link PivotRule}).
     */
    final boolean pivotStick;
    /** Whether the relative normal spin is held at zero by an exact pivoting stick (rolling only). */
    boolean pivotHeld;
    /** Time (s) of the last pivoting release, so that the hold is not taken again at the same instant. */
    double pivotReleasedAt = Double.NaN;
    /** Geometry workspace of this patch (world frame). */
    final ContactGeometry geo = new ContactGeometry();
    /** The law's view of this contact. */
    final ContactContext ctx = new ContactContext();
    /** The patch's pose and rates at {@link #poseTime}. */
    final MotionState pose = new MotionState();
    private double poseTime = Double.NaN;
    /** Rolling, sliding or apart. */
    Mode mode = Mode.APART;
    /** The patch's compliant contact, or null for a rigid one. */
    final org.trundle.core.Compliance compliance;
    /**
     * Compliant patch: whether a contact is under way (begun by an impact event or pressed at the start, until
     * the approach falls through zero); only then does its force act. The phase stays flight meanwhile.
     */
    boolean pressing;
    /** Compliant patch: the normal speed relative to the patch (m/s) at which this contact began (sets its damping). */
    double touchSpeed = 1.0;
    /**
     * Compliant patch: the wall curvatures (1/m) of the last stiffness asked and that stiffness (N/m^{3/2}), so that a
     * patch of constant curvature asks its {@code Compliance.Stiffness} once (a stiffness shared by patches of
     * different curvatures would otherwise solve the Hertz problem again on every evaluation).
     */
    double stiffnessCurvature1 = Double.NaN;
    double stiffnessCurvature2 = Double.NaN;
    double stiffness;
    /** Whether the law context holds the ball and this slot's geometry workspace. */
    boolean contextReady;
    /**
     * With several contacts: the unit slip direction held while this contact's slip is within the stick
     * band (at the onset of sliding, against the friction rolling needed; afterwards the slip direction at
     * the last accepted step end). The single contact keeps its own in {@link Dynamics#slideDir0}.
     */
    final double[] slideDir = new double[3];

    // broad phase: the last exact distance and where it was taken (still patches only)
    private final double[] reachPoint = new double[3];
    private double reachDistance;
    private boolean reachValid;
    private final double[] probe = new double[3];

    ContactSlot(int index, Patch patch) {
        this.index = index;
        this.id = patch.id();
        this.contactIds = java.util.List.of(id);
        this.surface = patch.surface();
        this.motion = patch.motion();
        this.moving = !motion.stationary();
        this.law = patch.law();
        this.compliance = patch.compliance();
        this.couples = law.addsCouples();
        this.pivotStick = couples && law.hasPivotStick() && !moving;
        this.geo.scratch = surface.newScratch();
    }

    /**
     * Queries the patch, where it is at time {@code t}, from point {@code x} into {@link #geo}.
     *
     * @param t time (s)
     * @param x query point (m)
     */
    void query(double t, double[] x) {
        if (!moving) {
            surface.query(t, x, geo);
            return;
        }
        poseAt(t).query(surface, t, x, geo);
    }

    /**
     * @param t time (s)
     * @return the pose at {@code t} (the slot's workspace)
     */
    MotionState poseAt(double t) {
        if (t != poseTime) {
            motion.at(t, pose);
            poseTime = t;
        }
        return pose;
    }

    /**
     * A lower bound of the signed distance of the centre from this patch's surface (m), exact when
     * the bound from the last exact query is {@code near} or less (the broad phase of flight). A
     * distance field is 1-Lipschitz, {@code d(x) ≥ d(x₀) − |x − x₀|}, so a patch known to be far stays
     * known to be far without a query until the ball has travelled the gap: a distant patch costs
     * one vector norm per check. Where the surface has no closest point (a tube's axis, a bowl's
     * centre) a point a thousandth of a radius away gives the bound, so a flight never needs a
     * closest point. A moving patch is queried every time.
     *
     * @param t time (s)
     * @param x centre (m)
     * @param near distance (m) at or below which the exact value is computed
     * @param step probe distance (m) for points without a closest point
     * @return a lower bound of d(x), exact when at most {@code near}
     * @throws SurfaceDomainException when neither x nor three points around it have a closest point
     */
    double distanceBound(double t, double[] x, double near, double step) {
        if (reachValid) {
            double dx = x[0] - reachPoint[0];
            double dy = x[1] - reachPoint[1];
            double dz = x[2] - reachPoint[2];
            double lb = reachDistance - Math.sqrt(dx * dx + dy * dy + dz * dz);
            if (lb > near) {
                return lb;
            }
        }
        try {
            query(t, x);
            remember(x, geo.distance);
            return geo.distance;
        } catch (SurfaceDomainException e) {
            for (int k = 0; k < 3; k++) {
                System.arraycopy(x, 0, probe, 0, 3);
                probe[k] += step;
                try {
                    query(t, probe);
                } catch (SurfaceDomainException again) {
                    continue;
                }
                remember(probe, geo.distance);
                return geo.distance - step;
            }
            throw e;
        }
    }

    private void remember(double[] x, double d) {
        if (moving) {
            return;
        }
        System.arraycopy(x, 0, reachPoint, 0, 3);
        reachDistance = d;
        reachValid = true;
    }
}
