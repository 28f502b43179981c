package org.trundle.scenario;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.stream.Stream;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.trundle.core.ContactGeometry;
import org.trundle.core.EndReason;
import org.trundle.core.RunResult;
import org.trundle.core.Surface;
import org.trundle.surfaces.Cone;
import org.trundle.surfaces.Side;
import org.trundle.surfaces.Sphere;
import org.trundle.surfaces.SplineTube;
import org.trundle.surfaces.SurfaceOfRevolution;
import org.trundle.surfaces.Torus;

/**
 * Every surface type of the scenario file builds the same surface as the Java API with the same
 * parameters (same geometry at a probe point, bit for bit), every key of each type is read, and a
 * short run on it closes its energy budget.
 */
class ScenarioSurfacesTest {
    private static final String REST = ", \"contact\": {\"law\": \"rolling\"},"
        + " \"run\": {\"duration\": 0.05}, \"start\": {\"position\": %s, \"velocity\": [0, 0, 0],"
        + " \"spin\": [0, 0, 0], \"on_surface\": false}}";

    static Stream<Arguments> cases() {
        double d = Math.toRadians(1);
        return Stream.of(
            Arguments.of("cone", "{\"type\": \"cone\", \"apex\": [0, 0, -0.1], \"axis\": [0, 0, 1], \"half_angle\": 30,"
                    + " \"side\": \"inside\", \"from\": 0.02, \"to\": 0.2}",
                new Cone(new Vector3D(0, 0, -0.1), Vector3D.PLUS_K, Math.toRadians(30), Side.INSIDE, 0.02, 0.2),
                new Vector3D(0.03, 0.01, 0.0)),
            Arguments.of("sphere", "{\"type\": \"sphere\", \"center\": [0, 0, 0.1], \"radius\": 0.1, \"side\": \"inside\","
                    + " \"pole\": [0, 0, -1], \"polar_from_deg\": 0, \"polar_to_deg\": 60}",
                new Sphere(new Vector3D(0, 0, 0.1), 0.1, Side.INSIDE, Vector3D.MINUS_K, 0, 60 * d),
                new Vector3D(0.01, 0.02, 0.02)),
            Arguments.of("torus", "{\"type\": \"torus\", \"center\": [0, 0, 0], \"axis\": [0, 0, 1], \"major_radius\": 0.1,"
                    + " \"minor_radius\": 0.02, \"side\": \"inside\", \"reference\": [1, 0, 0], \"azimuth_from_deg\": -90,"
                    + " \"azimuth_to_deg\": 90, \"tube_from_deg\": -180, \"tube_to_deg\": 0}",
                new Torus(Vector3D.ZERO, Vector3D.PLUS_K, Vector3D.PLUS_I, 0.1, 0.02, Side.INSIDE, -90 * d, 90 * d,
                    -180 * d, 0),
                new Vector3D(0.1, 0.01, -0.005)),
            Arguments.of("revolution", "{\"type\": \"revolution\", \"origin\": [0, 0, 0], \"axis\": [0, 0, 1],"
                    + " \"profile\": [[0, 0.02], [0.05, 0.025], [0.1, 0.04]], \"side\": \"inside\"}",
                new SurfaceOfRevolution(Vector3D.ZERO, Vector3D.PLUS_K, new double[] {0, 0.05, 0.1},
                    new double[] {0.02, 0.025, 0.04}, Side.INSIDE),
                new Vector3D(0.01, 0.0, 0.05)),
            Arguments.of("spline_tube", "{\"type\": \"spline_tube\", \"centerline\": [[0, 0, 0], [0.1, 0, -0.02],"
                    + " [0.2, 0.03, -0.05]], \"radius\": [0.02, 0.02, 0.025], \"side\": \"inside\", \"reference\": [0, 0, -1],"
                    + " \"angle_from_deg\": -120, \"angle_to_deg\": 120}",
                new SplineTube(new Vector3D[] {Vector3D.ZERO, new Vector3D(0.1, 0, -0.02), new Vector3D(0.2, 0.03, -0.05)},
                    new double[] {0.02, 0.02, 0.025}, Side.INSIDE, Vector3D.MINUS_K, -120 * d, 120 * d),
                new Vector3D(0.1, 0.0, -0.025)));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void scenarioSurfaceEqualsTheJavaOne(String type, String surfaceJson, Surface expected, Vector3D probe) {
        String json = "{\"ball\": {\"radius\": 0.005, \"mass\": 0.004}, \"surface\": " + surfaceJson
            + String.format(REST, "[" + probe.getX() + ", " + probe.getY() + ", " + probe.getZ() + "]");
        Scenario s = ScenarioParsingTest.parse(json);
        Surface got = s.simulation().surface();
        assertEquals(expected.name(), got.name());
        ContactGeometry a = new ContactGeometry();
        ContactGeometry b = new ContactGeometry();
        a.scratch = expected.newScratch();
        b.scratch = got.newScratch();
        expected.query(0, probe.toArray(), a);
        got.query(0, probe.toArray(), b);
        assertArrayEquals(a.point, b.point);
        assertArrayEquals(a.normal, b.normal);
        assertArrayEquals(a.hessian, b.hessian);
        assertEquals(a.patchMargin, b.patchMargin);
        assertEquals(expected.hasEdges(), got.hasEdges());
        RunResult res = s.simulation().run(s.start(), 0.05);
        assertTrue(res.endReason() != EndReason.BUDGET, res.toString());
        assertTrue(res.energy().relativeResidual() < 1e-8, type + ": " + res.energy());
    }

    @org.junit.jupiter.api.Test
    void listKeysAreChecked() {
        String base = "{\"ball\": {\"radius\": 0.005, \"mass\": 0.004}, \"surface\": %s"
            + String.format(REST, "[0.1, 0, -0.02]");
        ScenarioException e = assertThrows(ScenarioException.class, () -> ScenarioParsingTest.parse(String.format(base,
            "{\"type\": \"spline_tube\", \"centerline\": [[0, 0, 0], [0.1, 0]], \"radius\": 0.02}")));
        assertTrue(e.getMessage().contains("surface.centerline[1]"), e.getMessage());
        e = assertThrows(ScenarioException.class, () -> ScenarioParsingTest.parse(String.format(base,
            "{\"type\": \"spline_tube\", \"centerline\": [[0, 0, 0], [0.2, 0, 0]], \"radius\": [0.02]}")));
        assertTrue(e.getMessage().contains("surface.radius") && e.getMessage().contains("list of 2"), e.getMessage());
        e = assertThrows(ScenarioException.class, () -> ScenarioParsingTest.parse(String.format(base,
            "{\"type\": \"revolution\", \"origin\": [0, 0, 0], \"axis\": [0, 0, 1], \"profile\": [[0, 0.02]],"
                + " \"side\": \"inside\"}")));
        assertTrue(e.getMessage().contains("surface.profile") && e.getMessage().contains("at least 2"), e.getMessage());
    }
}
