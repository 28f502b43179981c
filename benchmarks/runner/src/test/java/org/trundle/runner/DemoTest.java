package org.trundle.runner;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import javax.imageio.ImageIO;

import com.fasterxml.jackson.databind.JsonNode;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.trundle.contact.Coulomb;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.EndReason;
import org.trundle.core.EventKind;
import org.trundle.core.RunEvent;
import org.trundle.core.RunResult;
import org.trundle.core.Simulation;
import org.trundle.core.SolverSettings;
import org.trundle.surfaces.Cylinder;
import org.trundle.surfaces.Side;
import org.trundle.scenario.ScenarioFiles;
import org.trundle.report.RunRecorder;

/**
 * The demo (invented data): its outcome read from the runner's files equals a run built directly
 * with the library API, and the exit time agrees with the closed-form rolling motion in a vertical
 * tube.
 */
class DemoTest {
    static final double G = 9.81;

    @TempDir
    Path dir;

    /** The demo scenario written out with the Java API (values copied from the resource). */
    static RunResult directRun() {
        Ball ball = Ball.solid(0.004, 0.0021);
        Cylinder tube = new Cylinder(Vector3D.ZERO, Vector3D.PLUS_K, 0.015, Side.INSIDE, -0.25, 0.0);
        Simulation sim = Simulation.builder().ball(ball).surface(tube).law(new Coulomb(0.4, 0.3, 0.5))
            .gravity(new Vector3D(0, 0, -G))
            .settings(SolverSettings.defaults().withTolerance(1e-10).withSampleInterval(0.001).withStopAtExit(true))
            .build();
        double el = Math.toRadians(-15);
        double az = Math.toRadians(90);
        Vector3D v = new Vector3D(0.9 * Math.cos(el) * Math.cos(az), 0.9 * Math.cos(el) * Math.sin(az), 0.9 * Math.sin(el));
        BallState start = sim.rollingStart(new Vector3D(0.011, 0, -0.002), v);
        return sim.run(start, 2.0);
    }

    @Test
    void demoOutcomeMatchesTheLibraryAndTheClosedForm() throws IOException {
        Path out = dir.resolve("demo");
        Cli.Result r = Cli.run("demo", "--out", out.toString());
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("Answer:   yes - out of the top of the tube at t = 0.1143 s"), r.out());

        JsonNode summary = ScenarioFiles.JSON.readTree(out.resolve("summary.json").toFile());
        RunResult direct = directRun();
        assertEquals(EndReason.EXIT, direct.endReason());
        RunEvent exit = direct.exit().orElseThrow();
        assertEquals("to", exit.edge());
        assertEquals("exit", summary.get("end_reason").asText());
        assertEquals(exit.time(), summary.get("end_time").asDouble(), 0.0);
        JsonNode ev = summary.get("events").get(0);
        assertEquals("exit", ev.get("kind").asText());
        assertEquals("to", ev.get("edge").asText());
        assertEquals(exit.time(), ev.get("time").asDouble(), 0.0);
        for (int i = 0; i < 3; i++) {
            assertEquals(exit.before().velocity().toArray()[i], ev.get("velocity").get(i).asDouble(), 0.0);
            assertEquals(exit.before().centre().toArray()[i], ev.get("position").get(i).asDouble(), 0.0);
            assertEquals(exit.before().spin().toArray()[i], ev.get("spin").get(i).asDouble(), 0.0);
        }
        assertEquals(direct.energy().initial(), summary.get("energy").get("initial").asDouble(), 0.0);
        for (String key : List.of("end_reason", "end_time", "end_state", "events", "energy", "max_distance_error",
            "max_normal_force", "phases")) {
            assertTrue(summary.has(key), "summary.json has " + key);
        }
        for (String key : List.of("position", "velocity", "spin")) {
            assertTrue(summary.get("end_state").has(key), "end_state has " + key);
        }
        for (String key : List.of("initial", "final", "friction_loss", "rolling_resistance_loss",
            "pivoting_resistance_loss", "impact_loss")) {
            assertTrue(summary.get("energy").has(key), "energy has " + key);
        }
        JsonNode phase = summary.get("phases").get(0);
        assertEquals("rolling", phase.get("phase").asText());
        assertEquals(0.0, phase.get("start").asDouble());
        assertEquals(exit.time(), phase.get("end").asDouble(), 0.0);
        assertEquals(direct.phases().get(0).centrePath(), phase.get("centre_path").asDouble(), 0.0);
        assertEquals(direct.maxNormalForce(), summary.get("max_normal_force").asDouble(), 0.0);

        // Closed form (M. Gualtieri, T. Tokieda et al., "Golfer's dilemma", Am. J. Phys. 74 (2006)
        // 497-501): rolling without slip on the inside of a vertical tube, the orbital rate
        // Omega = u/(R - r) is constant and the height is harmonic with rate lambda = Omega sqrt(k/(1+k))
        // about z0 - g/(k Omega^2) (no initial spin about the radial direction). The exit is the first
        // time the centre's height reaches the rim z = 0.
        assertTrue(direct.eventsOf(EventKind.SLIP).isEmpty(), "the demo ball rolls all the way");
        double k = Ball.SOLID;
        double el = Math.toRadians(-15);
        double u = 0.9 * Math.cos(el);
        double vz0 = 0.9 * Math.sin(el);
        double omega = u / (0.015 - 0.004);
        double lambda = omega * Math.sqrt(k / (1 + k));
        double z0 = -0.002;
        double mean = z0 - G / (k * omega * omega);
        double tExit = firstRoot(t -> mean + (z0 - mean) * Math.cos(lambda * t) + vz0 / lambda * Math.sin(lambda * t),
            1e-6, 2.0);
        // integration at relative tolerance 1e-10 over ~30 steps leaves height errors far below 1e-10 m;
        // at the rim the height rises at ~0.14 m/s, so 1e-9 s is a safe bound on the time error
        assertEquals(tExit, exit.time(), 1e-9);
        System.out.println("demo exit time " + exit.time() + " s, closed form " + tExit + " s, difference "
            + (exit.time() - tExit) + " s");
        double vzExit = (mean - z0) * lambda * Math.sin(lambda * tExit) + vz0 * Math.cos(lambda * tExit);
        assertEquals(vzExit, exit.before().velocity().getZ(), 1e-8);
        double speedExit = Math.hypot(omega * (0.015 - 0.004), vzExit);
        assertEquals(speedExit, exit.before().velocity().getNorm(), 1e-8);
    }

    @Test
    void demoWritesReadableFilesAndCanBeRepeated() throws IOException {
        Path out = dir.resolve("again");
        assertEquals(0, Cli.run("demo", "--out", out.toString()).code());
        Cli.Result second = Cli.run("demo", "--out", out.toString());
        assertEquals(0, second.code(), "the demo replaces its own folder: " + second.err());
        List<String> lines = Files.readAllLines(out.resolve("trajectory.csv"));
        assertTrue(lines.get(0).startsWith(RunRecorder.HEADER + ","), lines.get(0));
        assertEquals("t,x,y,z,vx,vy,vz,wx,wy,wz,phase,normal_force,friction_force", RunRecorder.HEADER);
        assertTrue(lines.get(0).endsWith(",event,wall_axial_m,wall_azimuth_rad"), lines.get(0));
        List<String> header = List.of(lines.get(0).split(",", -1));
        int event = header.indexOf("event");
        int axial = header.indexOf("wall_axial_m");
        assertEquals("start", lines.get(1).split(",", -1)[event], lines.get(1));
        String[] last = lines.get(lines.size() - 1).split(",", -1);
        assertEquals("exit;end", last[event], lines.get(lines.size() - 1));
        // the tube's axis is the z axis through the origin: the closest point's axial position is the centre's z
        assertEquals(Double.parseDouble(last[3]), Double.parseDouble(last[axial]), 1e-15);
        // rows every 1 ms from 0 plus the exit instant
        double tExit = directRun().exit().orElseThrow().time();
        assertEquals(1 + (int) Math.floor(tExit / 0.001) + 1, lines.size() - 1);
        assertEquals(0.001, Double.parseDouble(lines.get(2).split(",")[0]), 0.0);
        BufferedImage png = ImageIO.read(out.resolve("run.png").toFile());
        assertNotNull(png);
        assertTrue(png.getWidth() >= 1000 && png.getHeight() >= 700);
        assertEquals(ScenarioFiles.demoText(), Files.readString(out.resolve("scenario.json")));
        // the copied scenario runs as is through the run command, with the same result
        Path again = dir.resolve("rerun");
        Cli.Result rerun = Cli.run("run", out.resolve("scenario.json").toString(), "--out", again.toString());
        assertEquals(0, rerun.code(), rerun.err());
        assertEquals(Files.readString(out.resolve("summary.json")), Files.readString(again.resolve("summary.json")));
    }

    /** Bisection for the first sign change of f on a scan from a to b (test helper). */
    static double firstRoot(java.util.function.DoubleUnaryOperator f, double a, double b) {
        double step = 1e-4;
        double x0 = a;
        double f0 = f.applyAsDouble(x0);
        for (double x = a + step; x <= b; x += step) {
            double f1 = f.applyAsDouble(x);
            if (Math.signum(f1) != Math.signum(f0)) {
                double lo = x - step;
                double hi = x;
                for (int i = 0; i < 200; i++) {
                    double m = 0.5 * (lo + hi);
                    if (Math.signum(f.applyAsDouble(m)) == Math.signum(f0)) {
                        lo = m;
                    } else {
                        hi = m;
                    }
                }
                return 0.5 * (lo + hi);
            }
            x0 = x;
            f0 = f1;
        }
        throw new AssertionError("no root in [" + a + ", " + b + "]");
    }
}
