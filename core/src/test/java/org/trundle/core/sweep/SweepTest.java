package org.trundle.core.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.ContactLaw;
import org.trundle.core.EndReason;
import org.trundle.core.RunEvent;
import org.trundle.core.RunResult;
import org.trundle.core.Simulation;
import org.trundle.core.SolverSettings;

/**
 * The sweep API on a test-only inclined ramp with unlimited grip (pure rolling): a solid ball
 * rolling up an incline of angle θ decelerates at {@code a = g sin θ/(1+k)} (5/7 g sin θ for
 * k = 2/5; rigid-body rolling on an incline, any mechanics textbook, e.g. Meriam &amp; Kraige,
 * Engineering Mechanics: Dynamics, plane kinetics of rigid bodies), so it reaches the top edge a
 * distance L up the slope iff {@code v0² ≥ 2 a L}.
 */
class SweepTest {
    static final double G = 9.81;
    static final double THETA = Math.toRadians(30);
    static final double L = 0.1;
    static final double R = 0.004;
    static final ContactLaw GRIP = () -> "test: unlimited grip";

    static Simulation sim(double checkInterval) {
        return Simulation.builder().ball(Ball.solid(R, 0.002)).surface(new Ramp(THETA, L)).law(GRIP)
            .gravity(new Vector3D(0, 0, -G))
            .settings(SolverSettings.defaults().withMaxCheckInterval(checkInterval)).build();
    }

    static BallState start(Simulation s, double speed) {
        Ramp ramp = (Ramp) s.surface();
        Vector3D c = new Vector3D(R * ramp.nx, 0, R * ramp.nz);
        return s.rollingStart(c, new Vector3D(speed * ramp.ux, 0, speed * ramp.uz));
    }

    /** Exact text of everything a run reports that a thread count could change. */
    static String fingerprint(SweepRun run) {
        if (!run.isSuccess()) {
            return run.index() + " failed " + run.failure().orElseThrow();
        }
        RunResult r = run.result().orElseThrow();
        StringBuilder b = new StringBuilder().append(run.index()).append(' ').append(r.endReason())
            .append(' ').append(r.endState()).append(' ').append(r.energy()).append(' ')
            .append(Double.toString(r.energy().fin())).append(' ').append(r.evaluations());
        for (RunEvent e : r.events()) {
            b.append(" | ").append(e).append(' ').append(e.after());
        }
        return b.toString();
    }

    static final RunFactory SPEED_ANGLE = p -> {
        Simulation s = sim(1e-3);
        double v = p.get("speed");
        double az = Math.toRadians(p.get("azimuth"));
        Ramp ramp = (Ramp) s.surface();
        Vector3D c = new Vector3D(R * ramp.nx, 0, R * ramp.nz);
        Vector3D u = new Vector3D(ramp.ux, 0, ramp.uz);
        Vector3D dir = u.scalarMultiply(Math.cos(az)).add(Math.sin(az), Vector3D.PLUS_J);
        return new RunSpec(s, s.rollingStart(c, dir.scalarMultiply(v)), 0.4);
    };

    @Test
    void oneAndTwoThreadsGiveBitIdenticalRuns() {
        Grid grid = Grid.of(Axis.linear("speed", 0.3, 1.2, 5), Axis.linear("azimuth", -40, 40, 3));
        List<String> one = new ArrayList<>();
        List<String> two = new ArrayList<>();
        Sweep.over(grid).threads(1).run(SPEED_ANGLE, r -> one.add(fingerprint(r)));
        Sweep.over(grid).threads(2).run(SPEED_ANGLE, r -> two.add(fingerprint(r)));
        assertEquals(15, one.size());
        assertEquals(one, two);
        // and equal to plain sequential runs outside the sweep machinery
        for (int i = 0; i < grid.size(); i++) {
            RunSpec spec = SPEED_ANGLE.create(grid.point(i));
            SweepRun direct = SweepRun.succeeded(grid.point(i), spec.simulation().run(spec.start(), spec.duration()));
            assertEquals(fingerprint(direct), one.get(i));
        }
    }

    @Test
    void randomSampleIsSeededAndThreadCountIndependent() {
        RandomSample a = RandomSample.of(42, 12, List.of(new RandomSample.Range("speed", 0.3, 1.2),
            new RandomSample.Range("azimuth", -40, 40)));
        RandomSample b = RandomSample.of(42, 12, List.of(new RandomSample.Range("speed", 0.3, 1.2),
            new RandomSample.Range("azimuth", -40, 40)));
        for (int i = 0; i < a.size(); i++) {
            assertEquals(a.point(i).toString(), b.point(i).toString());
            assertTrue(a.point(i).get("speed") >= 0.3 && a.point(i).get("speed") < 1.2);
        }
        List<String> one = new ArrayList<>();
        List<String> two = new ArrayList<>();
        Sweep.over(a).threads(1).run(SPEED_ANGLE, r -> one.add(fingerprint(r)));
        Sweep.over(b).threads(2).run(SPEED_ANGLE, r -> two.add(fingerprint(r)));
        assertEquals(one, two);
    }

    @Test
    void gridIsRowMajorWithExactEnds() {
        Grid g = Grid.of(Axis.linear("a", 0, 1, 3), Axis.of("b", 10, 20));
        assertEquals(6, g.size());
        double[][] expect = {{0, 10}, {0, 20}, {0.5, 10}, {0.5, 20}, {1, 10}, {1, 20}};
        for (int i = 0; i < 6; i++) {
            assertEquals(expect[i][0], g.point(i).get("a"));
            assertEquals(expect[i][1], g.point(i).get("b"));
            assertEquals(i, g.point(i).index());
        }
        assertEquals(0.3, Axis.linear("x", 0.1, 0.3, 7).value(6));
        assertThrows(IllegalArgumentException.class, () -> Grid.of(Axis.of("a", 1), Axis.of("a", 2)));
        assertThrows(IllegalArgumentException.class, () -> Axis.linear("a", 0, 1, 0));
    }

    /**
     * Grid values are the doubles nearest the decimal values asked for (0.2 by 0.05 reaches 0.8,
     * not 0.7999999999999999 as binary interpolation gives), each from its index alone; bounds
     * that are not short decimals fall back to binary interpolation with exact ends.
     */
    @Test
    void gridValuesAreTheNearestDoublesOfTheirDecimals() {
        Axis a = Axis.linear("speed", 0.2, 1.6, 29);
        for (int i = 0; i < 29; i++) {
            double exact = new java.math.BigDecimal("0.2").add(new java.math.BigDecimal("0.05")
                .multiply(java.math.BigDecimal.valueOf(i))).doubleValue();
            assertEquals(exact, a.value(i), 0.0, "value " + i);
        }
        assertEquals("0.8", Double.toString(a.value(12)));
        assertEquals("-0.3", Double.toString(Axis.linear("x", -1.5, 0.3, 7).value(4)));
        Axis third = Axis.linear("t", 0, 1, 4);
        assertEquals(1.0 / 3, third.value(1), 1e-16);
        assertEquals(1.0, third.value(3), 0.0);
        Axis wide = Axis.linear("w", Math.PI, 1e300, 5);
        assertEquals(1e300, wide.value(4), 0.0);
        assertEquals(Math.PI, wide.value(0), 0.0);
    }

    @Test
    void failedRunsAreRecordedAndDoNotStopTheSweep() {
        Grid grid = Grid.of(Axis.of("speed", 0.5, -1, 0.7, 99, 0.9));
        RunFactory f = p -> {
            double v = p.get("speed");
            if (v < 0) {
                throw new IllegalArgumentException("speed must be positive, got " + v);
            }
            Simulation s = sim(1e-3);
            BallState st = start(s, v);
            if (v == 99) {
                st = st.withCentre(Vector3D.ZERO); // centre in the plane: the ball penetrates it
            }
            return new RunSpec(s, st, 0.3);
        };
        for (int threads = 1; threads <= 2; threads++) {
            List<SweepRun> runs = new ArrayList<>();
            SweepSummary sum = Sweep.over(grid).threads(threads).run(f, runs::add);
            assertEquals(new SweepSummary(5, 5, 2, false), sum);
            assertEquals(List.of(true, false, true, false, true), runs.stream().map(SweepRun::isSuccess).toList());
            assertEquals("IllegalArgumentException: speed must be positive, got -1.0", runs.get(1).failure().orElseThrow());
            assertTrue(runs.get(3).failure().orElseThrow().contains("distance"), runs.get(3).failure().orElseThrow());
            for (int i : new int[] {0, 2, 4}) {
                assertEquals(i, runs.get(i).index());
                RunSpec spec = f.create(grid.point(i));
                assertEquals(fingerprint(SweepRun.succeeded(grid.point(i), spec.simulation().run(spec.start(), 0.3))),
                    fingerprint(runs.get(i)));
            }
        }
    }

    @Test
    void progressCountsEveryDeliveredRunInOrder() {
        Grid grid = Grid.of(Axis.linear("speed", 0.3, 1.2, 7), Axis.of("azimuth", 0));
        List<int[]> calls = new ArrayList<>();
        List<Integer> order = new ArrayList<>();
        SweepSummary s = Sweep.over(grid).threads(2).progress((done, total) -> calls.add(new int[] {done, total}))
            .run(SPEED_ANGLE, r -> order.add(r.index()));
        assertEquals(7, calls.size());
        for (int i = 0; i < 7; i++) {
            assertEquals(i + 1, calls.get(i)[0]);
            assertEquals(7, calls.get(i)[1]);
            assertEquals(i, order.get(i));
        }
        assertEquals(new SweepSummary(7, 7, 0, false), s);
    }

    @Test
    void cancellationByTheConsumerDeliversAPrefix() {
        Grid grid = Grid.of(Axis.linear("speed", 0.3, 1.2, 20), Axis.of("azimuth", 0));
        Cancellation c = new Cancellation();
        List<Integer> got = new ArrayList<>();
        SweepSummary s = Sweep.over(grid).threads(2).cancellation(c).run(SPEED_ANGLE, r -> {
            got.add(r.index());
            if (got.size() == 5) {
                c.cancel();
            }
        });
        assertEquals(List.of(0, 1, 2, 3, 4), got);
        assertEquals(5, s.delivered());
        assertTrue(s.cancelled());

        Cancellation before = new Cancellation();
        before.cancel();
        SweepSummary none = Sweep.over(grid).cancellation(before).run(SPEED_ANGLE, r -> got.add(-1));
        assertEquals(0, none.delivered());
        assertTrue(none.cancelled());
        assertEquals(5, got.size());
    }

    /** Runs 1..3 would take practically forever; cancelling must abandon them in flight. */
    @Test
    @Timeout(value = 120, unit = TimeUnit.SECONDS) // a hang guard only, not a speed check
    void cancellationAbandonsRunsInFlight() {
        Grid grid = Grid.of(Axis.of("speed", 0.5, 0.5, 0.5, 0.5));
        RunFactory f = p -> {
            Simulation s = sim(1e-3).withSettings(SolverSettings.defaults().withSampleInterval(1e-6));
            return new RunSpec(s, start(s, p.get("speed")), p.index() == 0 ? 0.01 : 1e6);
        };
        Cancellation c = new Cancellation();
        List<SweepRun> got = new ArrayList<>();
        SweepSummary s = Sweep.over(grid).threads(2).cancellation(c).run(f, r -> {
            got.add(r);
            c.cancel();
        });
        assertEquals(1, got.size());
        assertEquals(EndReason.DURATION, got.get(0).result().orElseThrow().endReason());
        assertTrue(s.cancelled());
    }

    @Test
    void bisectionFindsTheSlowestSpeedThatReachesTheTop() {
        double a = G * Math.sin(THETA) / (1 + Ball.SOLID);
        double vStar = Math.sqrt(2 * a * L);
        // event checks every 10 us: a run just above v* crosses the edge for 2 sqrt(2 v* dv)/a s,
        // so an excess dv below (a * 5e-6)^2 / (2 v*) ~ 2e-10 m/s may be missed: that is the bias bound
        Simulation s = sim(1e-5);
        RunFactory f = p -> new RunSpec(s, start(s, p.get("speed")), 0.5);
        double tol = 1e-7;
        Boundary b = BoundarySearch.of("speed", 0.2, 1.5, tol)
            .find(f, run -> run.result().orElseThrow().endReason() == EndReason.EXIT);
        assertTrue(b.width() <= tol, "width " + b.width());
        assertEquals(Boolean.FALSE, b.outcomeAtLow());
        assertEquals(Boolean.TRUE, b.outcomeAtHigh());
        double bias = 1e-9;
        assertTrue(b.low() <= vStar + bias && vStar - bias <= b.high(),
            "bracket [" + b.low() + ", " + b.high() + "] vs v* = " + vStar);
        System.out.println("bisection bracket [" + b.low() + ", " + b.high() + "] m/s, v* = " + vStar + " m/s, runs "
            + b.runs());
        assertEquals(2 + (int) Math.ceil(Math.log(1.3 / tol) / Math.log(2)), b.runs());
        assertTrue(b.highRun().result().orElseThrow().exit().isPresent());
        assertFalse(b.lowRun().result().orElseThrow().exit().isPresent());
    }

    @Test
    void bisectionRejectsEqualOutcomesAtBothEnds() {
        Simulation s = sim(1e-3);
        RunFactory f = p -> new RunSpec(s, start(s, p.get("speed")), 0.5);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> BoundarySearch
            .of("speed", 1.0, 1.5, 1e-3).find(f, run -> run.result().orElseThrow().endReason()));
        assertTrue(e.getMessage().contains("EXIT at both ends"), e.getMessage());
    }
}
