package org.trundle.core.check;

import java.util.OptionalDouble;
import java.util.function.DoubleFunction;

import org.trundle.core.ContactContext;
import org.trundle.core.ContactLaw;

/**
 * A contact law that knows how to rebuild itself with every length multiplied by a factor
 * {@code λ} (rolling- and pivoting-resistance lengths, a compliance length), so that
 * {@link Invariants#scaling(double, double)} can scale it. It acts exactly as the law built for
 * {@code λ = 1}:
 *
 * <pre>{@code
 * double delta = 1e-5;
 * ContactLaw law = ScalableLaw.of(l -> new Coulomb(0.3, 0.2, 0.5).and(new RollingResistance(delta * l)));
 * }</pre>
 *
 * <p>Immutable when the laws it builds are.
 */
public final class ScalableLaw implements ContactLaw {
    private final DoubleFunction<ContactLaw> build;
    private final double factor;
    private final ContactLaw law;

    private ScalableLaw(DoubleFunction<ContactLaw> build, double factor) {
        this.build = build;
        this.factor = factor;
        this.law = build.apply(factor);
        if (law == null) {
            throw new IllegalArgumentException("the law builder gave null for factor " + factor);
        }
    }

    /**
     * @param build gives the law with its lengths multiplied by the argument
     * @return the law for factor 1
     */
    public static ScalableLaw of(DoubleFunction<ContactLaw> build) {
        if (build == null) {
            throw new IllegalArgumentException("law builder must be given, got null");
        }
        return new ScalableLaw(build, 1.0);
    }

    /**
     * @param lambda length factor, positive
     * @return this law with its lengths multiplied by lambda
     */
    public ScalableLaw scaled(double lambda) {
        return new ScalableLaw(build, factor * org.trundle.core.internal.Checks.positive("lambda", lambda));
    }

    @Override
    public double gripLimit(ContactContext c) {
        return law.gripLimit(c);
    }

    @Override
    public double slidingFriction(ContactContext c) {
        return law.slidingFriction(c);
    }

    @Override
    public void addCouples(ContactContext c) {
        law.addCouples(c);
    }

    @Override
    public boolean addsCouples() {
        return law.addsCouples();
    }

    @Override
    public double rollingHoldLimit(ContactContext c) {
        return law.rollingHoldLimit(c);
    }

    @Override
    public double pivotHoldLimit(ContactContext c) {
        return law.pivotHoldLimit(c);
    }

    @Override
    public boolean hasPivotStick() {
        return law.hasPivotStick();
    }

    @Override
    public double pivotStickLimit(ContactContext c) {
        return law.pivotStickLimit(c);
    }

    @Override
    public OptionalDouble restitution() {
        return law.restitution();
    }

    @Override
    public String name() {
        return law.name();
    }
}
