package org.trundle.core;

/**
 * Energy account of a run (J). Mechanical energy is {@code E = ½ m |v|² + ½ I |ω|² − m g·c}
 * (potential zero at the world origin). The budget closes when
 * {@code E_final − E_initial + losses − appliedWork − driveWork ≈ 0}; {@link #residual()} is that sum, and
 * {@link #scale()} is {@code E_scale = max kinetic energy + m |g| L} with {@code L} the run's extent
 * (the largest distance of the centre from its start), against which residuals are judged.
 *
 * <p>Immutable.
 */
public final class EnergyBudget {
    private final double initial;
    private final double fin;
    private final double slidingFriction;
    private final double rollingResistance;
    private final double pivotingResistance;
    private final double otherCouples;
    private final double impacts;
    private final double appliedWork;
    private final double driveWork;
    private final double scale;
    private final double contactDamping;

    /**
     * @param initial initial mechanical energy (J)
     * @param fin final mechanical energy (J)
     * @param slidingFriction energy lost to sliding friction, including sticking impulses (J)
     * @param rollingResistance energy lost to rolling resistance (J)
     * @param pivotingResistance energy lost to pivoting resistance (J)
     * @param otherCouples energy lost to other contact couples (J)
     * @param impacts energy lost in impacts (J)
     * @param appliedWork work done by applied loads (J)
     * @param scale energy scale E_scale (J)
     */
    public EnergyBudget(double initial, double fin, double slidingFriction, double rollingResistance,
                        double pivotingResistance, double otherCouples, double impacts, double appliedWork,
                        double scale) {
        this(initial, fin, slidingFriction, rollingResistance, pivotingResistance, otherCouples, impacts, appliedWork,
            scale, 0.0);
    }

    /**
     * A budget with the damping work of a compliant contact ({@link LossKind#CONTACT_DAMPING}); with a compliant
     * contact the mechanical energies include the elastic energy stored in the contact.
     *
     * @param initial initial mechanical energy (J)
     * @param fin final mechanical energy (J)
     * @param slidingFriction energy lost to sliding friction, including sticking impulses (J)
     * @param rollingResistance energy lost to rolling resistance (J)
     * @param pivotingResistance energy lost to pivoting resistance (J)
     * @param otherCouples energy lost to other contact couples (J)
     * @param impacts energy lost in impacts (J)
     * @param appliedWork work done by applied loads (J)
     * @param scale energy scale E_scale (J)
     * @param contactDamping energy lost to the damping of a compliant contact (J)
     */
    public EnergyBudget(double initial, double fin, double slidingFriction, double rollingResistance,
                        double pivotingResistance, double otherCouples, double impacts, double appliedWork,
                        double scale, double contactDamping) {
        this(initial, fin, slidingFriction, rollingResistance, pivotingResistance, otherCouples, impacts, appliedWork,
            0.0, scale, contactDamping);
    }

    /**
     * A budget with the drive work of moving surfaces and the damping work of a compliant contact.
     *
     * @param initial initial mechanical energy (J)
     * @param fin final mechanical energy (J)
     * @param slidingFriction energy lost to sliding friction, including sticking impulses (J)
     * @param rollingResistance energy lost to rolling resistance (J)
     * @param pivotingResistance energy lost to pivoting resistance (J)
     * @param otherCouples energy lost to other contact couples (J)
     * @param impacts energy lost in impacts (J)
     * @param appliedWork work done by applied loads (J)
     * @param driveWork work done on the ball by moving surfaces (J)
     * @param scale energy scale E_scale (J)
     * @param contactDamping energy lost to the damping of a compliant contact (J)
     */
    public EnergyBudget(double initial, double fin, double slidingFriction, double rollingResistance,
                        double pivotingResistance, double otherCouples, double impacts, double appliedWork,
                        double driveWork, double scale, double contactDamping) {
        this.contactDamping = contactDamping;
        this.initial = initial;
        this.fin = fin;
        this.slidingFriction = slidingFriction;
        this.rollingResistance = rollingResistance;
        this.pivotingResistance = pivotingResistance;
        this.otherCouples = otherCouples;
        this.impacts = impacts;
        this.appliedWork = appliedWork;
        this.driveWork = driveWork;
        this.scale = scale;
    }

    /** @return initial mechanical energy (J) */
    public double initial() {
        return initial;
    }

    /** @return final mechanical energy (J) */
    public double fin() {
        return fin;
    }

    /** @return energy lost to sliding friction (J) */
    public double slidingFrictionLoss() {
        return slidingFriction;
    }

    /** @return energy lost to rolling resistance (J) */
    public double rollingResistanceLoss() {
        return rollingResistance;
    }

    /** @return energy lost to pivoting resistance (J) */
    public double pivotingResistanceLoss() {
        return pivotingResistance;
    }

    /** @return energy lost to other contact couples (J) */
    public double otherCoupleLoss() {
        return otherCouples;
    }

    /** @return energy lost in impacts (J) */
    public double impactLoss() {
        return impacts;
    }

    /** @return energy lost to the damping of a compliant contact (J) */
    public double contactDampingLoss() {
        return contactDamping;
    }

    /** @return work done on the ball by applied loads (J) */
    public double appliedWork() {
        return appliedWork;
    }

    /**
     * Work done on the ball by moving surfaces (J): the power {@code F·u(p) + τ_c·Ω} of the contact
     * force and couple at the contact point of a patch moving with velocity field {@code u} and spin
     * {@code Ω}, integrated over the run, plus {@code J·u(p)} of every contact impulse (design notes
     * §9). Zero on still surfaces.
     *
     * @return drive work (J)
     */
    public double driveWork() {
        return driveWork;
    }

    /** @return total dissipated energy (J) */
    public double totalLoss() {
        return slidingFriction + rollingResistance + pivotingResistance + otherCouples + impacts + contactDamping;
    }

    /** @return {@code E_final − E_initial + losses − appliedWork − driveWork} (J); zero for a closed budget */
    public double residual() {
        return fin - initial + totalLoss() - appliedWork - driveWork;
    }

    /** @return E_scale (J) */
    public double scale() {
        return scale;
    }

    /** @return |residual| / E_scale */
    public double relativeResidual() {
        return Math.abs(residual()) / scale;
    }

    @Override
    public String toString() {
        return String.format(java.util.Locale.ROOT,
            "E0=%.6e J, E1=%.6e J, friction=%.3e, rolling=%.3e, pivoting=%.3e, other=%.3e, impacts=%.3e,"
                + " damping=%.3e, applied=%.3e, drive=%.3e, residual/scale=%.2e", initial, fin, slidingFriction,
            rollingResistance, pivotingResistance, otherCouples, impacts, contactDamping, appliedWork, driveWork,
            relativeResidual());
    }
}
