package org.trundle.core.engine;

/**
 * What every switch rule reads of one state, evaluated once per state and shared by all rules
 * (Hipparchus asks each detector in turn about the same few states of a step). Physical units.
 * A mutable workspace of the {@link Snapshots} cache.
 */
final class Snapshot {
    /** Normal force F_n (N); contact phases. */
    double normalForce;
    /** Grip minus the tangential force rolling needs (N); rolling. */
    double gripMargin;
    /** Slip speed |s| (m/s); sliding. */
    double slipSpeed;
    /** Contact-point slip velocity {@code P(v − r ω × n)} (m/s); sliding. */
    final double[] slip = new double[3];
    /** Speed measure |v| + r|ω| (m/s); contact phases. */
    double speed;
    /** Patch margin (m), positive inside the patch. */
    double patchMargin;
    /** Centre distance d from the surface (m). */
    double distance;
    /** Frobenius norm of the distance Hessian (1/m). */
    double hessianNorm;
    /** Fit margin {@code 1 − r κ₁}. */
    double fitMargin;
    /** Unit normal at the contact. */
    final double[] normal = new double[3];
    /**
     * Constraint drift: the larger of the distance residual over (projection threshold · r) and the
     * quaternion-norm drift over its threshold; contact phases only, 0 in flight.
     */
    double drift;
    /** Acceleration measure |a| + r|α| (m/s²); contact phases. */
    double acceleration;
    /** Spin about the normal {@code ω·n} (rad/s); rolling with a set-valued pivoting couple only. */
    double normalSpin;
    /**
     * The law's set-valued pivoting couple minus the magnitude of the contact couple about the normal
     * that keeps {@code ω·n} constant (N·m); rolling with a set-valued pivoting couple only.
     */
    double pivotMargin;
    /** Kinetic energy (J). */
    double kinetic;
    /**
     * Flight: per patch (scene order), a lower bound of the centre's signed distance from the patch's
     * surface (m), exact within two radii of it (see {@link ContactSlot#distanceBound}).
     */
    final double[] slotDistance;
    /**
     * Contact phases of a scene: per patch not touched, the patch margin (m) of the closest point when
     * {@link #slotDistance} is exact, else 0 (the in-contact impact test of {@link ImpactRule}).
     */
    final double[] slotMargin;
    /** Contact phases of a scene: per patch not touched, the norm of its distance Hessian (1/m) where exact, else 0. */
    final double[] slotHessianNorm;

    // several contacts (issue 12), per position of the contact set (0: the active slot)
    /** Normal force per contact (N). */
    final double[] contactNormalForce = new double[ContactForceSolver.MAX_CONTACTS];
    /** Grip minus needed tangential force per rolling contact (N). */
    final double[] contactGripMargin = new double[ContactForceSolver.MAX_CONTACTS];
    /** Slip speed per contact (m/s). */
    final double[] contactSlipSpeed = new double[ContactForceSolver.MAX_CONTACTS];
    /** Slip velocity per contact (m/s). */
    final double[][] contactSlip = new double[ContactForceSolver.MAX_CONTACTS][3];
    /** Patch margin per contact (m). */
    final double[] contactMargin = new double[ContactForceSolver.MAX_CONTACTS];
    /** Largest distance residual {@code |d_i − r|} over the contacts (m). */
    double contactDistanceError;
    /** Largest normal force over the contacts (N). */
    double contactLargestForce;

    Snapshot(int patches) {
        slotDistance = new double[patches];
        slotMargin = new double[patches];
        slotHessianNorm = new double[patches];
    }
}
