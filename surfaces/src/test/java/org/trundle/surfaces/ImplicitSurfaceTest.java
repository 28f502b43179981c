package org.trundle.surfaces;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import java.util.stream.IntStream;
import java.util.stream.Stream;

import org.hipparchus.CalculusFieldElement;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.trundle.core.ContactGeometry;
import org.trundle.core.Surface;
import org.trundle.core.SurfaceDomainException;

/**
 * Custom surfaces from one implicit function against the closed forms of the same shapes
 * (cross-check of two implementations, as the design notes ask), and the README's worked example,
 * an elliptic tube (an invented shape), against finite differences of its own distance field.
 */
class ImplicitSurfaceTest {
    static final long SEED = 41L;
    static final double BIG_R = 0.2;
    static final double TUBE_B = 0.05;

    /** Cylinder of radius 0.05 m about the z axis: f = x² + y² − R². */
    static final ImplicitFunction CYLINDER = new ImplicitFunction() {
        @Override
        public <T extends CalculusFieldElement<T>> T value(T x, T y, T z) {
            return x.square().add(y.square()).subtract(TUBE_B * TUBE_B);
        }
    };

    /** Sphere of radius 0.2 m about the origin: f = |x|² − R². */
    static final ImplicitFunction SPHERE = new ImplicitFunction() {
        @Override
        public <T extends CalculusFieldElement<T>> T value(T x, T y, T z) {
            return x.square().add(y.square()).add(z.square()).subtract(BIG_R * BIG_R);
        }
    };

    /** Torus R = 0.2 m, b = 0.05 m about the z axis, quartic form (|x|² + R² − b²)² − 4R²(x² + y²). */
    static final ImplicitFunction TORUS = new ImplicitFunction() {
        @Override
        public <T extends CalculusFieldElement<T>> T value(T x, T y, T z) {
            T rr = x.square().add(y.square());
            return rr.add(z.square()).add(BIG_R * BIG_R - TUBE_B * TUBE_B).square().subtract(rr.multiply(4 * BIG_R * BIG_R));
        }
    };

    static Stream<Arguments> cases() {
        return Stream.of("cylinder", "sphere", "torus").flatMap(k ->
            Stream.of(Side.INSIDE, Side.OUTSIDE).flatMap(side ->
                IntStream.range(0, 10).mapToObj(i -> Arguments.of(k, side, SEED, i))));
    }

    @ParameterizedTest(name = "{0} {1} seed={2} case={3}")
    @MethodSource("cases")
    void implicitAgreesWithClosedForm(String kind, Side side, long seed, int index) {
        SplittableRandom rnd = new SplittableRandom(seed * 1000 + index + 97L * kind.length() + side.ordinal());
        Surface closed;
        Surface custom;
        double[] x;
        double len;
        double phi = rnd.nextDouble(-Math.PI, Math.PI);
        double in = side == Side.INSIDE ? rnd.nextDouble(0.2, 0.9) : rnd.nextDouble(1.1, 1.8);
        switch (kind) {
            case "cylinder":
                closed = new Cylinder(Vector3D.ZERO, Vector3D.PLUS_K, TUBE_B, side);
                custom = ImplicitSurface.of(CYLINDER).label("cylinder").side(side).lengthScale(TUBE_B).build();
                x = new double[] {in * TUBE_B * Math.cos(phi), in * TUBE_B * Math.sin(phi), rnd.nextDouble(-1, 1)};
                len = TUBE_B;
                break;
            case "sphere": {
                closed = new Sphere(Vector3D.ZERO, BIG_R, side);
                custom = ImplicitSurface.of(SPHERE).label("sphere").side(side).lengthScale(BIG_R).build();
                double th = rnd.nextDouble(0.1, 3.0);
                x = new double[] {in * BIG_R * Math.sin(th) * Math.cos(phi), in * BIG_R * Math.sin(th) * Math.sin(phi),
                    in * BIG_R * Math.cos(th)};
                len = BIG_R;
                break;
            }
            default: {
                closed = new Torus(Vector3D.ZERO, Vector3D.PLUS_K, BIG_R, TUBE_B, side);
                custom = ImplicitSurface.of(TORUS).label("torus").side(side).lengthScale(BIG_R).build();
                double psi = rnd.nextDouble(-Math.PI, Math.PI);
                double rho = BIG_R + in * TUBE_B * Math.cos(psi);
                x = new double[] {rho * Math.cos(phi), rho * Math.sin(phi), in * TUBE_B * Math.sin(psi)};
                len = TUBE_B;
                break;
            }
        }
        ContactGeometry a = GeometryAssertions.query(closed, x);
        // a second query of the same run seeded from the hint must give the same answer
        ContactGeometry b = GeometryAssertions.query(custom, x);
        for (int pass = 0; pass < 2; pass++) {
            for (int i = 0; i < 3; i++) {
                assertEquals(a.point[i], b.point[i], 1e-10 * len, "point");
                assertEquals(a.normal[i], b.normal[i], 1e-10, "normal");
            }
            assertEquals(a.distance, b.distance, 1e-10 * len, "distance");
            for (int i = 0; i < 9; i++) {
                assertEquals(a.hessian[i], b.hessian[i], 1e-10 / len, "hessian[" + i + "]");
            }
            assertEquals(a.curvature1, b.curvature1, 1e-10 / len, "curvature1");
            assertEquals(a.curvature2, b.curvature2, 1e-10 / len, "curvature2");
            x[0] += 1e-4 * len;
            x[2] -= 1e-4 * len;
            closed.query(0, x, a);
            custom.query(0, x, b);
        }
    }

    /** The README example: an elliptic tube with semi-axes 0.03 m and 0.02 m about the z axis. */
    static Surface ellipticTube() {
        ImplicitFunction f = new ImplicitFunction() {
            @Override
            public <T extends CalculusFieldElement<T>> T value(T x, T y, T z) {
                return x.divide(0.03).square().add(y.divide(0.02).square()).subtract(1.0);
            }
        };
        // largest curvature of an ellipse a/b² at the ends of the minor... here 0.03/0.02² = 75 1/m
        return ImplicitSurface.of(f).label("elliptic tube 0.03 x 0.02 m").side(Side.INSIDE).lengthScale(0.02).maxConcaveCurvature(0.03 / (0.02 * 0.02)).build();
    }

    @Test
    void ellipticTubeMatchesFiniteDifferencesAndEllipseCurvature() {
        Surface tube = ellipticTube();
        SplittableRandom rnd = new SplittableRandom(SEED);
        for (int i = 0; i < 20; i++) {
            double t = rnd.nextDouble(-Math.PI, Math.PI);
            double in = rnd.nextDouble(0.5, 0.95);
            double[] x = {in * 0.03 * Math.cos(t), in * 0.02 * Math.sin(t), rnd.nextDouble(-0.1, 0.1)};
            GeometryAssertions.checkAgainstFiniteDifferences(tube, x, 0.02);
        }
        // at the end of the major axis (0.03, 0): curvature of an ellipse a/b² (textbook)
        ContactGeometry g = GeometryAssertions.query(tube, new double[] {0.025, 0, 0});
        assertEquals(0.03 / (0.02 * 0.02), g.curvature1, 1e-9);
        assertEquals(0.0, g.curvature2, 1e-9);
        assertEquals(0.005, g.distance, 1e-15);
        // at the end of the minor axis (0, 0.02): b/a²
        ContactGeometry h = GeometryAssertions.query(tube, new double[] {0, 0.015, 0});
        assertEquals(0.02 / (0.03 * 0.03), h.curvature1, 1e-9);
    }

    @Test
    void badInputAndDomain() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
            () -> ImplicitSurface.of(SPHERE).label("s").side(Side.INSIDE).lengthScale(-1).build());
        assertTrue(e.getMessage().contains("lengthScale") && e.getMessage().contains("-1"), e.getMessage());
        Surface s = ImplicitSurface.of(SPHERE).label("sphere").side(Side.INSIDE).lengthScale(BIG_R).maxConcaveCurvature(1 / BIG_R).build();
        // the centre of the sphere is a focal point: no unique closest point
        assertThrows(SurfaceDomainException.class, () -> GeometryAssertions.query(s, new double[] {0, 0, 0}));
    }
}
