package org.trundle.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import com.fasterxml.jackson.databind.JsonNode;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.trundle.contact.Coulomb;
import org.trundle.contact.PureRolling;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.ContactGeometry;
import org.trundle.core.Phase;
import org.trundle.core.Simulation;
import org.trundle.core.SolverSettings;
import org.trundle.core.sweep.ParameterPoint;
import org.trundle.core.sweep.RandomSample;
import org.trundle.surfaces.Cylinder;
import org.trundle.surfaces.Side;

/** Scenario documents parse into the objects they describe, every documented key included, and round-trip. */
class ScenarioParsingTest {

    static Scenario parse(String json) {
        return Scenario.parse(ScenarioFiles.parse(json));
    }

    /** Everything a scenario builds, as exact text. */
    static String fingerprint(Scenario s) {
        Simulation sim = s.simulation();
        SolverSettings set = sim.settings();
        return s.description() + "|" + sim.ball() + "|" + sim.surface().name() + "|" + sim.law().name() + "|"
            + sim.gravity() + "|" + s.start() + "|" + s.start().orientation().getQ0() + "|" + s.duration() + "|"
            + set.tolerance() + "|" + set.sampleInterval() + "|" + set.stopAtExit() + "|" + set.maxCheckInterval();
    }

    @Test
    void documentsRoundTripThroughTextAndPaths() throws Exception {
        JsonNode doc = ScenarioFiles.parse(ScenarioFiles.demoText());
        Scenario a = Scenario.parse(doc);
        Scenario b = Scenario.parse(ScenarioFiles.parse(ScenarioFiles.JSON.writeValueAsString(doc)));
        assertEquals(fingerprint(a), fingerprint(b));
        // a value set at a path reads back exactly and changes only that value
        double odd = 0.123456789012345678;
        JsonNode c = ScenarioPath.parse("start.position[2]").set(doc, -odd * 0.01);
        assertEquals(-odd * 0.01, c.get("start").get("position").get(2).doubleValue(), 0.0);
        assertEquals(-odd * 0.01, Scenario.parse(c).start().centre().getZ(), 0.0);
        assertEquals(doc.get("ball"), c.get("ball"));
        assertEquals(-0.002, doc.get("start").get("position").get(2).doubleValue(), 0.0, "the original is untouched");
        JsonNode d = ScenarioPath.parse("contact.static_friction").set(doc, 0.55);
        assertEquals("coulomb(mu_s=0.55, mu_k=0.3, e=0.5)", Scenario.parse(d).simulation().law().name());
    }

    @Test
    void demoKeysBuildTheDescribedObjects() {
        Scenario s = parse(ScenarioFiles.demoText());
        Simulation sim = s.simulation();
        assertEquals(Ball.solid(0.004, 0.0021), sim.ball());
        Cylinder cyl = assertInstanceOf(Cylinder.class, sim.surface());
        assertEquals(0.015, cyl.radius());
        assertEquals(Side.INSIDE, cyl.side());
        assertEquals(-0.25, cyl.from());
        assertEquals(0.0, cyl.to());
        assertEquals(Vector3D.PLUS_K, cyl.axis());
        Coulomb law = assertInstanceOf(Coulomb.class, sim.law());
        assertEquals(0.4, law.staticFriction());
        assertEquals(0.3, law.kineticFriction());
        assertEquals(0.5, law.restitution().getAsDouble());
        assertEquals(new Vector3D(0, 0, -9.81), sim.gravity());
        assertEquals(2.0, s.duration());
        assertEquals(1e-10, sim.settings().tolerance());
        assertEquals(0.001, sim.settings().sampleInterval());
        assertTrue(sim.settings().stopAtExit());
        // speed 0.9 m/s at 15 degrees below horizontal, azimuth 90 degrees: along +y and down
        double el = Math.toRadians(-15);
        double az = Math.toRadians(90);
        assertEquals(new Vector3D(0.9 * Math.cos(el) * Math.cos(az), 0.9 * Math.cos(el) * Math.sin(az),
            0.9 * Math.sin(el)), s.start().velocity());
        assertEquals(Phase.ROLLING, s.start().phase());
        // "rolling" spin: v = r w x n with the wall normal n = -x at the start point
        Vector3D n = new Vector3D(-1, 0, 0);
        assertEquals(0, s.start().velocity().subtract(Vector3D.crossProduct(s.start().spin(), n).scalarMultiply(0.004))
            .getNorm(), 1e-15);
        assertEquals(0, s.start().spin().dotProduct(n), 1e-12, "no spin about the normal");
    }

    /**
     * Rolling and pivoting resistance lengths add their couples: a ball rolling at 0.3 m/s on a
     * level plane with δ = 2e-4 m, r = 0.01 m stops at rest after v0² (1+k) r/(2 δ g) (derived in
     * PlaneFrictionTest).
     */
    @Test
    void resistanceLengthsAddTheirLaws() {
        Scenario s = parse("{\"ball\": {\"radius\": 0.01, \"mass\": 0.03},"
            + " \"surface\": {\"type\": \"plane\", \"origin\": [0, 0, 0], \"normal\": [0, 0, 1]},"
            + " \"contact\": {\"law\": \"coulomb\", \"static_friction\": 0.5, \"kinetic_friction\": 0.4,"
            + " \"rolling_resistance\": 2e-4, \"pivoting_resistance\": 1e-5},"
            + " \"start\": {\"position\": [0, 0, 0.01], \"velocity\": [0.3, 0, 0], \"spin\": \"rolling\"},"
            + " \"run\": {\"duration\": 10}}");
        Simulation sim = s.simulation();
        assertTrue(sim.law().name().contains("rolling resistance(delta=2.0E-4 m)"), sim.law().name());
        assertTrue(sim.law().name().contains("pivoting resistance(delta_p=1.0E-5 m)"), sim.law().name());
        org.trundle.core.RunResult res = sim.run(s.start(), 10);
        assertEquals(org.trundle.core.EndReason.REST, res.endReason());
        double xStop = 0.09 * 1.4 * 0.01 / (2 * 2e-4 * 9.81);
        assertEquals(xStop, res.endState().centre().getX(), 1e-8 * xStop);
    }

    @Test
    void everyOtherKeyIsRead() {
        String json = "{\"description\": \"keys\","
            + " \"ball\": {\"radius\": 0.01, \"mass\": 0.05, \"inertia\": \"hollow\"},"
            + " \"surface\": {\"type\": \"plane\", \"origin\": [0, 0, 1], \"normal\": [0, 0, 2]},"
            + " \"contact\": {\"law\": \"rolling\", \"restitution\": 0.25, \"rolling_resistance\": 0,"
            + " \"pivoting_resistance\": 0.0},"
            + " \"gravity\": [0, -9.8, 0],"
            + " \"start\": {\"position\": [0, 0, 1.01], \"velocity\": [1, 0, 0], \"spin\": [0, 50, 0]},"
            + " \"run\": {\"duration\": 0.5, \"tolerance\": 1e-8, \"sample_interval\": 0, \"stop_at_exit\": false,"
            + " \"max_check_interval\": 1e-4}}";
        Scenario s = parse(json);
        Simulation sim = s.simulation();
        assertEquals("keys", s.description());
        assertEquals(Ball.THIN_SHELL, sim.ball().inertiaFactor());
        ContactGeometry g = sim.geometryAt(new Vector3D(0.3, 0.2, 1.5), 0);
        assertEquals(0.5, g.distance, 1e-15);
        assertEquals(1.0, g.normal[2]);
        PureRolling law = assertInstanceOf(PureRolling.class, sim.law());
        assertEquals(0.25, law.restitution().getAsDouble());
        assertEquals(new Vector3D(0, -9.8, 0), sim.gravity());
        assertEquals(Phase.SLIDING, s.start().phase(), "a contact start with a given spin asks for sliding");
        assertEquals(new Vector3D(0, 50, 0), s.start().spin());
        assertEquals(1e-8, sim.settings().tolerance());
        assertEquals(0.0, sim.settings().sampleInterval());
        assertFalse(sim.settings().stopAtExit());
        assertEquals(1e-4, sim.settings().maxCheckInterval());

        // defaults: gravity, inertia, restitution, open cylinder, outside side, numeric inertia, forced flight
        Scenario t = parse("{\"ball\": {\"radius\": 0.01, \"mass\": 0.05},"
            + " \"surface\": {\"type\": \"cylinder\", \"side\": \"outside\", \"radius\": 0.1, \"origin\": [0, 0, 0],"
            + " \"axis\": [1, 0, 0]}, \"contact\": {\"law\": \"coulomb\", \"static_friction\": 0.5,"
            + " \"kinetic_friction\": 0.5}, \"start\": {\"position\": [0, 0, 0.11], \"velocity\": [0, 0.1, 0],"
            + " \"spin\": [0, 0, 0], \"on_surface\": false}, \"run\": {\"duration\": 1}}");
        assertEquals(Scenario.DEFAULT_GRAVITY, t.simulation().gravity());
        assertEquals(Ball.SOLID, t.simulation().ball().inertiaFactor());
        assertEquals(0.0, t.simulation().law().restitution().getAsDouble());
        assertFalse(t.simulation().surface().hasEdges());
        assertEquals(Side.OUTSIDE, ((Cylinder) t.simulation().surface()).side());
        assertEquals(Phase.FLIGHT, t.start().phase(), "on_surface false: a flight start although touching");
        assertEquals(SolverSettings.defaults().tolerance(), t.simulation().settings().tolerance());
        Scenario u = parse(ScenarioFiles.demoText().replace("\"inertia\": \"solid\"", "\"inertia\": 0.5")
            .replace("\"spin\": \"rolling\"", "\"spin\": \"rolling\", \"on_surface\": true"));
        assertEquals(0.5, u.simulation().ball().inertiaFactor());
        assertEquals(Phase.ROLLING, u.start().phase());
        // a start off the surface is a flight start
        Scenario v = parse(ScenarioFiles.demoText().replace("[0.011, 0, -0.002]", "[0.002, 0, 0.05]")
            .replace("\"spin\": \"rolling\"", "\"spin\": [1, 2, 3]"));
        BallState f = v.start();
        assertEquals(Phase.FLIGHT, f.phase());
        assertEquals(new Vector3D(1, 2, 3), f.spin());
    }

    @Test
    void sweepSectionsBuildTheirSpaces() {
        String base = ScenarioFiles.demoText().replace("\"run\":", "\"sweep\": SWEEP,\n  \"run\":");
        SweepSpec grid = SweepSpec.parse(ScenarioFiles.parse(base.replace("SWEEP",
            "{\"start.speed\": {\"from\": 0.2, \"to\": 1.0, \"count\": 5}, \"start.elevation_deg\": [-10, -20],"
                + " \"labels\": {\"exit_to\": \"out of the top\"}}")));
        assertFalse(grid.random());
        assertEquals(10, grid.space().size());
        assertEquals(List.of("start.speed", "start.elevation_deg"), grid.space().names());
        ParameterPoint p = grid.space().point(3);
        assertEquals(0.4, p.get("start.speed"), 1e-15);
        assertEquals(-20, p.get("start.elevation_deg"));
        assertEquals("out of the top", grid.labels().get("exit_to"));
        Scenario s3 = grid.scenario(ScenarioFiles.parse(base.replace("SWEEP", "{\"start.speed\": [1]}")), p);
        assertEquals(0.4 * Math.sin(Math.toRadians(-20)), s3.start().velocity().getZ(), 1e-16);

        SweepSpec random = SweepSpec.parse(ScenarioFiles.parse(base.replace("SWEEP",
            "{\"start.velocity[2]\": {\"from\": -1.0, \"to\": 0.0}, \"random\": {\"samples\": 4, \"seed\": 5}}")
            .replace("\"speed\": 0.9, \"elevation_deg\": -15, \"azimuth_deg\": 90", "\"velocity\": [0, 0.8, -0.3]")));
        assertTrue(random.random());
        RandomSample expect = RandomSample.of(5, 4, List.of(new RandomSample.Range("start.velocity[2]", -1.0, 0.0)));
        for (int i = 0; i < 4; i++) {
            assertEquals(expect.point(i).value(0), random.space().point(i).value(0), 0.0);
        }
    }
}
