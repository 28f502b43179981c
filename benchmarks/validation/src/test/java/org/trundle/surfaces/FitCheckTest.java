package org.trundle.surfaces;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.stream.Stream;

import org.hipparchus.CalculusFieldElement;
import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.RotationConvention;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.trundle.contact.PureRolling;
import org.trundle.core.Ball;
import org.trundle.core.Simulation;
import org.trundle.core.Surface;

/**
 * The fit check {@code r·κ_max < 1} on every surface's concave side (design notes §2): a ball whose
 * radius reaches the smallest concave radius of curvature is rejected with a message naming the
 * surface and the numbers; a slightly smaller one is accepted.
 */
class FitCheckTest {

    static Stream<Arguments> surfaces() {
        ImplicitFunction ellipse = new ImplicitFunction() {
            @Override
            public <T extends CalculusFieldElement<T>> T value(T x, T y, T z) {
                return x.divide(0.03).square().add(y.divide(0.02).square()).subtract(1.0);
            }
        };
        Surface sphere = new Sphere(Vector3D.ZERO, 0.1, Side.INSIDE);
        return Stream.of(
            // name, surface, smallest concave radius of curvature (m), a phrase the name contains
            Arguments.of("bowl", sphere, 0.1, "sphere(inside, R=0.100000"),
            Arguments.of("funnel", new Cone(Vector3D.ZERO, Vector3D.PLUS_K, 0.5, Side.INSIDE, 0.02, 1),
                0.02 * Math.sin(0.5) / (Math.cos(0.5) * Math.cos(0.5)), "cone(inside"),
            Arguments.of("torus tube", new Torus(Vector3D.ZERO, Vector3D.PLUS_K, 0.2, 0.03, Side.INSIDE), 0.03, "torus(inside"),
            Arguments.of("torus hole", new Torus(Vector3D.ZERO, Vector3D.PLUS_K, 0.2, 0.03, Side.OUTSIDE), 0.17, "torus(outside"),
            Arguments.of("placed bowl", new Placed(sphere, new Rotation(Vector3D.PLUS_I, 1.0, RotationConvention.VECTOR_OPERATOR),
                Vector3D.PLUS_J), 0.1, "placed(sphere(inside"),
            Arguments.of("elliptic tube", ImplicitSurface.of(ellipse).label("elliptic tube").side(Side.INSIDE).lengthScale(0.02).maxConcaveCurvature(0.03 / 0.0004).build(),
                0.0004 / 0.03, "implicit(elliptic tube"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("surfaces")
    void tooLargeBallIsRejected(String label, Surface surface, double radiusOfCurvature, String phrase) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
            () -> build(surface, radiusOfCurvature * 1.0001));
        String m = e.getMessage();
        assertTrue(m.contains(phrase), m);
        assertTrue(m.contains("r*kappa_max = 1.000"), m);
        assertDoesNotThrow(() -> build(surface, radiusOfCurvature * 0.999));
    }

    static Simulation build(Surface s, double r) {
        return Simulation.builder().ball(Ball.solid(r, 0.01)).surface(s).law(new PureRolling())
            .gravity(new Vector3D(0, 0, -9.81)).build();
    }
}
