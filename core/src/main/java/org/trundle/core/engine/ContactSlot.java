package org.trundle.core.engine;

import org.trundle.core.ContactContext;
import org.trundle.core.ContactGeometry;
import org.trundle.core.ContactLaw;
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
    /** Geometry workspace of this patch (world frame). */
    final ContactGeometry geo = new ContactGeometry();
    /** The law's view of this contact. */
    final ContactContext ctx = new ContactContext();
    /** The patch's pose and rates at {@link #poseTime}. */
    final MotionState pose = new MotionState();
    private double poseTime = Double.NaN;
    /** Rolling, sliding or apart. */
    Mode mode = Mode.APART;

    ContactSlot(Surface surface, SurfaceMotion motion, ContactLaw law) {
        this.surface = surface;
        this.motion = motion;
        this.moving = !motion.stationary();
        this.law = law;
        this.couples = law.addsCouples();
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
}
