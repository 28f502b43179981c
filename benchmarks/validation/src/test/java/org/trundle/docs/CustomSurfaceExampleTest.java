package org.trundle.docs;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.CalculusFieldElement;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.trundle.contact.PureRolling;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.ContactGeometry;
import org.trundle.core.EndReason;
import org.trundle.core.RunResult;
import org.trundle.core.Simulation;
import org.trundle.core.SolverSettings;
import org.trundle.core.Surface;
import org.trundle.surfaces.Bounded;
import org.trundle.surfaces.ImplicitFunction;
import org.trundle.surfaces.ImplicitSurface;
import org.trundle.surfaces.Side;

/** The README's custom-surface example (an invented elliptic tube), compiled and run. */
class CustomSurfaceExampleTest {

    @Test
    void ellipticTubeExampleRuns() {
        // --- README example start ---
        // An elliptic tube (semi-axes 30 mm x 20 mm) about the z axis, written once as f(x, y, z) = 0.
        ImplicitFunction ellipse = new ImplicitFunction() {
            @Override
            public <T extends CalculusFieldElement<T>> T value(T x, T y, T z) {
                return x.divide(0.030).square().add(y.divide(0.020).square()).subtract(1.0);
            }
        };
        // Ball inside (where f < 0); length scale 20 mm; largest concave curvature a/b² = 75 1/m.
        Surface tube = ImplicitSurface.of(ellipse).label("elliptic tube 30 x 20 mm").side(Side.INSIDE)
            .lengthScale(0.020).maxConcaveCurvature(0.030 / (0.020 * 0.020)).build();
        Simulation sim = Simulation.builder().ball(Ball.solid(0.005, 0.004)).surface(tube)
            .law(new PureRolling()).gravity(new Vector3D(0, 0, -9.81))
            .settings(SolverSettings.defaults().withSampleInterval(1e-3)).build();
        BallState start = sim.rollingStart(new Vector3D(0.025, 0, 0), new Vector3D(0, 0.6, 0));
        RunResult result = sim.run(start, 0.5);
        // The same tube cut to 0 <= z <= 0.3 m: leaving through either plane is an exit event.
        Surface shortTube = Bounded.of(tube)
            .plane("bottom", Vector3D.ZERO, Vector3D.PLUS_K)           // keep z >= 0
            .plane("top", new Vector3D(0, 0, 0.3), Vector3D.MINUS_K)    // keep z <= 0.3 m
            .build();
        // --- README example end ---
        ContactGeometry g = new ContactGeometry();
        g.scratch = shortTube.newScratch();
        shortTube.query(0, new double[] {0.025, 0, 0.01}, g);
        assertEquals("bottom", shortTube.edgeName(g.edge));
        assertEquals(0.01, g.patchMargin, 1e-12);
        g.hintValid = false;  // a new point far from the last: no Newton seed
        shortTube.query(0, new double[] {0.0, 0.015, 0.29}, g);
        assertEquals("top", shortTube.edgeName(g.edge));
        assertEquals(0.01, g.patchMargin, 1e-12);
        assertEquals(EndReason.DURATION, result.endReason(), result.message());
        assertTrue(result.energy().relativeResidual() < 1e-8, result.energy().toString());
        assertTrue(result.maxDistanceError() < 1e-9 * 0.005, "distance residual " + result.maxDistanceError());
        System.out.println("elliptic tube example: energy " + result.energy().relativeResidual() + ", distance residual "
            + result.maxDistanceError() + " m, end centre " + result.endState().centre());
    }
}
