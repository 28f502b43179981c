package org.trundle.core.check;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.function.Supplier;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.BallState;
import org.trundle.core.EnergyBudget;
import org.trundle.core.PhaseSpan;
import org.trundle.core.RunEvent;
import org.trundle.core.RunResult;
import org.trundle.core.SimulationException;
import org.trundle.core.SurfaceDomainException;

/**
 * The robustness probe: runs an attempt (building the inputs and running the solver, so that
 * rejected constructions count too) and classifies what happens as an {@link Outcome}. The rule:
 * a valid result, a clear rejection or a typed stop (a {@link SimulationException} with a message
 * and a finite last good state, or a result ending {@code budget} or {@code geometry} with a
 * message) — never a NaN in a result, never an unexplained exception, never a
 * {@link SurfaceDomainException} out of a run. A hang is prevented by the attempt's own budget
 * ({@link org.trundle.core.SolverSettings#withMaxEvaluations(long)}), which ends the run with
 * {@link org.trundle.core.EndReason#BUDGET}.
 */
public final class Robustness {
    private Robustness() {
    }

    /**
     * Runs and classifies one attempt.
     *
     * @param description the case's description
     * @param attempt builds the inputs and runs the solver
     * @return the probe
     */
    public static Probe probe(String description, Supplier<RunResult> attempt) {
        RunResult res;
        try {
            res = attempt.get();
        } catch (IllegalArgumentException e) {
            return messageOf(e) == null ? new Probe(Outcome.FAILURE, description, "rejection without a message: " + e)
                : new Probe(Outcome.REJECTED, description, e.getMessage());
        } catch (SimulationException e) {
            if (messageOf(e) == null) {
                return new Probe(Outcome.FAILURE, description, "typed stop without a message: " + e);
            }
            String bad = state("last good state", e.lastGoodState());
            return bad != null ? new Probe(Outcome.FAILURE, description, "typed stop with a broken " + bad)
                : new Probe(Outcome.TYPED_STOP, description, e.getClass().getSimpleName() + ": " + e.getMessage());
        } catch (SurfaceDomainException e) {
            // a run turns the surface's refusal into a geometry stop; the start's into a rejection
            return new Probe(Outcome.FAILURE, description, "surface exception escaped the run: " + e.getMessage());
        } catch (RuntimeException | StackOverflowError e) {
            return new Probe(Outcome.FAILURE, description, "unexplained " + e + " at " + where(e));
        }
        if (res == null) {
            return new Probe(Outcome.FAILURE, description, "null result");
        }
        String bad = nonFinite(res);
        if (bad != null) {
            return new Probe(Outcome.FAILURE, description, "non-finite number in the result: " + bad);
        }
        switch (res.endReason()) {
            case BUDGET:
            case GEOMETRY:
                return res.message() == null || res.message().isBlank()
                    ? new Probe(Outcome.FAILURE, description, "typed stop " + res.endReason().label() + " without a message")
                    : new Probe(Outcome.TYPED_STOP, description, res.endReason().label() + ": " + res.message());
            default:
                return new Probe(Outcome.VALID, description, res.endReason().label());
        }
    }

    /**
     * @param res a result
     * @return the name of the first non-finite number in it, or null when all are finite
     */
    public static String nonFinite(RunResult res) {
        String s = state("end state", res.endState());
        if (s != null) {
            return s;
        }
        for (RunEvent e : res.events()) {
            s = state("event " + e.kind().label() + " before", e.before());
            if (s == null) {
                s = state("event " + e.kind().label() + " after", e.after());
            }
            if (s == null && !finite(e.impulse())) {
                s = "event " + e.kind().label() + " impulse " + e.impulse();
            }
            if (s != null) {
                return s;
            }
        }
        for (PhaseSpan p : res.phases()) {
            if (!Double.isFinite(p.start()) || !Double.isFinite(p.end()) || !Double.isFinite(p.centrePath())) {
                return "phase span " + p;
            }
        }
        EnergyBudget b = res.energy();
        double[] e = {b.initial(), b.fin(), b.slidingFrictionLoss(), b.rollingResistanceLoss(),
            b.pivotingResistanceLoss(), b.otherCoupleLoss(), b.impactLoss(), b.appliedWork(), b.driveWork(), b.scale(),
            b.relativeResidual()};
        for (double x : e) {
            if (!Double.isFinite(x)) {
                return "energy budget " + b;
            }
        }
        if (!Double.isFinite(res.maxDistanceError()) || !Double.isFinite(res.maxNormalForce())) {
            return "residuals " + res.maxDistanceError() + ", " + res.maxNormalForce();
        }
        return null;
    }

    private static String state(String what, BallState s) {
        if (s == null) {
            return what + " is null";
        }
        Rotation q = s.orientation();
        if (!Double.isFinite(s.time()) || !finite(s.centre()) || !finite(s.velocity()) || !finite(s.spin())
            || !Double.isFinite(q.getQ0() + q.getQ1() + q.getQ2() + q.getQ3())) {
            return what + " " + s;
        }
        return null;
    }

    private static boolean finite(Vector3D v) {
        return Double.isFinite(v.getX()) && Double.isFinite(v.getY()) && Double.isFinite(v.getZ());
    }

    private static String messageOf(Throwable e) {
        String m = e.getMessage();
        return m == null || m.isBlank() ? null : m;
    }

    private static String where(Throwable e) {
        StackTraceElement[] st = e.getStackTrace();
        return st.length == 0 ? "?" : st[0].toString();
    }

    /**
     * Counts of outcomes over a campaign, with the first few failures kept for the report. Not
     * thread-safe; merge per-thread tallies with {@link #add(Tally)}.
     */
    public static final class Tally {
        private final Map<Outcome, Long> counts = new EnumMap<>(Outcome.class);
        private final List<Probe> failures = new java.util.ArrayList<>();
        private final Map<String, Long> reasons = new java.util.TreeMap<>();

        /** Creates an empty tally. */
        public Tally() {
            for (Outcome o : Outcome.values()) {
                counts.put(o, 0L);
            }
        }

        /**
         * @param p a probe to count
         */
        public void add(Probe p) {
            counts.merge(p.outcome(), 1L, Long::sum);
            if (p.outcome() == Outcome.FAILURE && failures.size() < 20) {
                failures.add(p);
            }
            if (p.outcome() != Outcome.VALID) {
                reasons.merge(p.outcome().label() + ": " + kindOf(p.detail()), 1L, Long::sum);
            }
        }

        /**
         * @param other another tally to add to this one
         */
        public void add(Tally other) {
            for (Outcome o : Outcome.values()) {
                counts.merge(o, other.counts.get(o), Long::sum);
            }
            for (Probe p : other.failures) {
                if (failures.size() < 20) {
                    failures.add(p);
                }
            }
            other.reasons.forEach((k, v) -> reasons.merge(k, v, Long::sum));
        }

        /**
         * @param o an outcome
         * @return how many probes had it
         */
        public long count(Outcome o) {
            return counts.get(o);
        }

        /** @return total probes */
        public long total() {
            return counts.values().stream().mapToLong(Long::longValue).sum();
        }

        /** @return the first (at most 20) failures */
        public List<Probe> failures() {
            return List.copyOf(failures);
        }

        /** @return counts of non-valid outcomes by the first words of their message */
        public Map<String, Long> reasons() {
            return new java.util.TreeMap<>(reasons);
        }

        private static String kindOf(String detail) {
            String d = detail.replaceAll("[-+]?[0-9][0-9.eE+-]*", "#");
            return d.length() > 70 ? d.substring(0, 70) : d;
        }

        /** @return the counts on one line */
        public String summary() {
            return "cases=" + total() + " valid=" + count(Outcome.VALID) + " rejected=" + count(Outcome.REJECTED)
                + " typed_stop=" + count(Outcome.TYPED_STOP) + " failures=" + count(Outcome.FAILURE);
        }
    }
}
