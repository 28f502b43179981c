package org.trundle.core;

import java.util.OptionalDouble;

/** Two contact laws acting together; see {@link ContactLaw#and(ContactLaw)}. */
final class CombinedLaw implements ContactLaw {
    private final ContactLaw a;
    private final ContactLaw b;
    private final OptionalDouble restitution;

    CombinedLaw(ContactLaw a, ContactLaw b) {
        if (a == null || b == null) {
            throw new IllegalArgumentException("contact law must be given, got null");
        }
        this.a = a;
        this.b = b;
        OptionalDouble ea = a.restitution();
        OptionalDouble eb = b.restitution();
        if (ea.isPresent() && eb.isPresent()) {
            throw new IllegalArgumentException("restitution is set twice, by " + a.name() + " and by " + b.name());
        }
        this.restitution = ea.isPresent() ? ea : eb;
    }

    /** Adds couples when either part does. */
    @Override
    public boolean addsCouples() {
        return a.addsCouples() || b.addsCouples();
    }

    @Override
    public double gripLimit(ContactContext c) {
        return Math.min(a.gripLimit(c), b.gripLimit(c));
    }

    @Override
    public double slidingFriction(ContactContext c) {
        return a.slidingFriction(c) + b.slidingFriction(c);
    }

    @Override
    public void addCouples(ContactContext c) {
        a.addCouples(c);
        b.addCouples(c);
    }

    @Override
    public double rollingHoldLimit(ContactContext c) {
        return a.rollingHoldLimit(c) + b.rollingHoldLimit(c);
    }

    @Override
    public double pivotHoldLimit(ContactContext c) {
        return a.pivotHoldLimit(c) + b.pivotHoldLimit(c);
    }

    @Override
    public boolean hasPivotStick() {
        return a.hasPivotStick() || b.hasPivotStick();
    }

    @Override
    public double pivotStickLimit(ContactContext c) {
        return a.pivotStickLimit(c) + b.pivotStickLimit(c);
    }

    @Override
    public OptionalDouble restitution() {
        return restitution;
    }

    @Override
    public String name() {
        return a.name() + " + " + b.name();
    }
}
