package org.trundle.bench;

import java.util.OptionalDouble;

import org.trundle.core.AppliedLoad;
import org.trundle.core.ContactContext;
import org.trundle.core.ContactGeometry;
import org.trundle.core.ContactLaw;
import org.trundle.core.LossKind;
import org.trundle.core.RunObserver;
import org.trundle.core.Surface;
import org.trundle.core.SurfaceDomainException;

/**
 * User code that turns hostile part-way through a run, for the {@link RobustnessCampaign}: a surface
 * whose geometry turns NaN, infinite or non-unit (or which throws), a contact law whose force bounds
 * turn NaN or negative or whose couple turns NaN, infinite or huge (or which throws), an applied
 * load that turns NaN, infinite or huge (or throws), an observer that throws, and an interrupt of
 * the running thread. Each must end the run with a typed stop carrying the last good state (or, for
 * a surface's own domain exception, a geometry stop); none may give a result with a NaN in it.
 *
 * <p>A surface, load or observer turns bad after a time, a law after a number of calls (it sees no
 * time). The hostile law counts its calls in a field: it must serve one run only, on one thread,
 * which the campaign guarantees by building it per case.
 */
final class HostileUserCode {
    /** What turns bad. */
    enum Fault {
        NONE, SURFACE_NAN_NORMAL, SURFACE_ZERO_NORMAL, SURFACE_LONG_NORMAL, SURFACE_NAN_DISTANCE,
        SURFACE_INFINITE_DISTANCE, SURFACE_NAN_HESSIAN, SURFACE_NAN_CURVATURE, SURFACE_NAN_MARGIN, SURFACE_THROWS,
        SURFACE_DOMAIN, LAW_NAN_GRIP, LAW_NEGATIVE_GRIP, LAW_NAN_FRICTION, LAW_INFINITE_FRICTION,
        LAW_NEGATIVE_FRICTION, LAW_NAN_COUPLE, LAW_INFINITE_COUPLE, LAW_HUGE_COUPLE, LAW_NAN_HOLD, LAW_THROWS,
        LOAD_NAN_FORCE, LOAD_INFINITE_TORQUE, LOAD_HUGE_FORCE, LOAD_THROWS, OBSERVER_THROWS, INTERRUPT;

        /** @return the lower-case name for case descriptions */
        String label() {
            return name().toLowerCase(java.util.Locale.ROOT);
        }

        boolean is(String family) {
            return name().startsWith(family);
        }
    }

    private HostileUserCode() {
    }

    /**
     * @param s a surface
     * @param f the fault
     * @param at time (s) from which the surface answers badly
     * @return the surface, or a hostile wrapper of it
     */
    static Surface surface(Surface s, Fault f, double at) {
        if (!f.is("SURFACE")) {
            return s;
        }
        return new Surface() {
            @Override
            public void query(double t, double[] x, ContactGeometry out) {
                s.query(t, x, out);
                if (t < at) {
                    return;
                }
                switch (f) {
                    case SURFACE_NAN_NORMAL:
                        out.normal[1] = Double.NaN;
                        break;
                    case SURFACE_ZERO_NORMAL:
                        out.normal[0] = 0;
                        out.normal[1] = 0;
                        out.normal[2] = 0;
                        break;
                    case SURFACE_LONG_NORMAL:
                        out.normal[0] *= 1.5;
                        out.normal[1] *= 1.5;
                        out.normal[2] *= 1.5;
                        break;
                    case SURFACE_NAN_DISTANCE:
                        out.distance = Double.NaN;
                        break;
                    case SURFACE_INFINITE_DISTANCE:
                        out.distance = Double.NEGATIVE_INFINITY;
                        break;
                    case SURFACE_NAN_HESSIAN:
                        out.hessian[0] = Double.NaN;
                        break;
                    case SURFACE_NAN_CURVATURE:
                        out.curvature1 = Double.NaN;
                        break;
                    case SURFACE_NAN_MARGIN:
                        out.patchMargin = Double.NaN;
                        break;
                    case SURFACE_THROWS:
                        throw new IllegalStateException("hostile surface refuses at t = " + t);
                    default:
                        throw new SurfaceDomainException("hostile surface undefined at t = " + t);
                }
            }

            @Override
            public boolean hasEdges() {
                return s.hasEdges();
            }

            @Override
            public String edgeName(int edge) {
                return s.edgeName(edge);
            }

            @Override
            public double maxConcaveCurvature() {
                return s.maxConcaveCurvature();
            }

            @Override
            public Object newScratch() {
                return s.newScratch();
            }

            @Override
            public String name() {
                return "hostile " + s.name();
            }
        };
    }

    /**
     * @param law a law
     * @param f the fault
     * @param calls calls after which the law answers badly
     * @return the law, or a hostile wrapper of it (one run only)
     */
    static ContactLaw law(ContactLaw law, Fault f, int calls) {
        if (!f.is("LAW")) {
            return law;
        }
        return new ContactLaw() {
            private int count;

            private boolean bad() {
                return ++count > calls;
            }

            @Override
            public double gripLimit(ContactContext c) {
                boolean b = bad();
                if (b && f == Fault.LAW_THROWS) {
                    throw new IllegalArgumentException("hostile law refuses after " + calls + " calls");
                }
                return !b ? law.gripLimit(c) : f == Fault.LAW_NAN_GRIP ? Double.NaN
                    : f == Fault.LAW_NEGATIVE_GRIP ? -1.0 : law.gripLimit(c);
            }

            @Override
            public double slidingFriction(ContactContext c) {
                return !bad() ? law.slidingFriction(c) : f == Fault.LAW_NAN_FRICTION ? Double.NaN
                    : f == Fault.LAW_INFINITE_FRICTION ? Double.POSITIVE_INFINITY
                    : f == Fault.LAW_NEGATIVE_FRICTION ? -1e-3 : law.slidingFriction(c);
            }

            @Override
            public void addCouples(ContactContext c) {
                law.addCouples(c);
                if (bad()) {
                    double m = f == Fault.LAW_NAN_COUPLE ? Double.NaN : f == Fault.LAW_INFINITE_COUPLE
                        ? Double.POSITIVE_INFINITY : f == Fault.LAW_HUGE_COUPLE ? 1e300 : 0.0;
                    c.addCouple(m, 0, m, LossKind.OTHER);
                }
            }

            @Override
            public boolean addsCouples() {
                return true;
            }

            @Override
            public double rollingHoldLimit(ContactContext c) {
                return f == Fault.LAW_NAN_HOLD && bad() ? Double.NaN : law.rollingHoldLimit(c);
            }

            @Override
            public double pivotHoldLimit(ContactContext c) {
                return law.pivotHoldLimit(c);
            }

            @Override
            public OptionalDouble restitution() {
                return law.restitution();
            }

            @Override
            public String name() {
                return "hostile " + law.name();
            }
        };
    }

    /**
     * @param f the fault
     * @param at time (s) from which the load is bad
     * @return an applied load (none unless the fault is one of the load's)
     */
    static AppliedLoad load(Fault f, double at) {
        if (!f.is("LOAD")) {
            return AppliedLoad.NONE;
        }
        return (s, out) -> {
            double t = s.time();
            if (t < at) {
                return;
            }
            switch (f) {
                case LOAD_NAN_FORCE:
                    out.force(0, 0, Double.NaN);
                    break;
                case LOAD_INFINITE_TORQUE:
                    out.torque(Double.NEGATIVE_INFINITY, 0, 0);
                    break;
                case LOAD_HUGE_FORCE:
                    out.force(1e300, 0, 0);
                    break;
                default:
                    throw new IllegalStateException("hostile load refuses at t = " + t);
            }
        };
    }

    /**
     * @param f the fault
     * @param at time (s) from which the observer throws, or interrupts its thread
     * @return an observer
     */
    static RunObserver observer(Fault f, double at) {
        if (f == Fault.OBSERVER_THROWS) {
            return s -> {
                if (s.state().time() >= at) {
                    throw new IllegalStateException("hostile observer refuses at t = " + s.state().time());
                }
            };
        } else if (f == Fault.INTERRUPT) {
            return s -> {
                if (s.state().time() >= at) {
                    Thread.currentThread().interrupt();
                }
            };
        }
        return RunObserver.NONE;
    }
}
