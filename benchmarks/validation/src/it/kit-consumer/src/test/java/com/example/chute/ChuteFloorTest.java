package com.example.chute;

import java.util.Arrays;
import java.util.stream.Stream;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.trundle.contact.Coulomb;
import org.trundle.core.ContactGeometry;
import org.trundle.core.Surface;
import org.trundle.core.check.CaseRecipe;
import org.trundle.core.check.CaseSource;
import org.trundle.core.check.GravitySampler;
import org.trundle.core.check.Interval;
import org.trundle.core.check.Invariants;
import org.trundle.core.check.PropertyCase;
import org.trundle.core.check.StartSampler;
import org.trundle.core.check.junit.PropertyArguments;
import org.trundle.core.check.junit.PropertyAssertions;

/** A user's property test of their own surface (the README example), built against the installed artifacts. */
class ChuteFloorTest {
    /** A chute floor (invented example): a plane tilted by theta (rad) about y, a strip of width w (m) across y. */
    record ChuteFloor(double theta, double width) implements Surface {
        @Override
        public void query(double t, double[] x, ContactGeometry out) {
            double nx = Math.sin(theta);
            double nz = Math.cos(theta);                      // unit normal, toward the ball
            double d = x[0] * nx + x[2] * nz;                 // signed distance from the plane through 0
            out.distance = d;
            out.point[0] = x[0] - d * nx;
            out.point[1] = x[1];
            out.point[2] = x[2] - d * nz;
            out.normal[0] = nx;
            out.normal[1] = 0;
            out.normal[2] = nz;
            Arrays.fill(out.hessian, 0.0);                    // flat: H = 0, no curvature
            out.curvature1 = 0;
            out.curvature2 = 0;
            out.patchMargin = width / 2 - Math.abs(x[1]);     // the side edges y = -w/2 and y = +w/2
            out.edge = x[1] < 0 ? 0 : 1;
        }

        @Override
        public String name() {
            return "chute floor(theta=" + theta + " rad, w=" + width + " m)";
        }

        @Override
        public boolean hasEdges() {
            return true;
        }

        @Override
        public double maxConcaveCurvature() {
            return 0.0;
        }
    }

    static final CaseSource CHUTE = CaseRecipe.builder().label("chute floor x coulomb")
        .surfaces((rnd, ball) -> new ChuteFloor(Interval.of(0.05, 0.5).draw(rnd), 0.04))
        .laws((rnd, ball) -> new Coulomb(0.3, 0.2, 0.5))
        .gravity(GravitySampler.fixed(new Vector3D(0, 0, -9.81)))
        .starts(StartSampler.near(Vector3D.ZERO, 0.015))   // rolling, sliding and flying starts
        .duration(0.2).build();

    static Stream<Arguments> chuteCases() {
        return PropertyArguments.of(CHUTE, 2026L, 30);      // seed 2026, 30 cases
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("chuteCases")
    void chuteFloorKeepsItsInvariants(PropertyCase c) {
        PropertyAssertions.assertHolds(c,
            Invariants.energyNeverRises(1e-8), Invariants.budgetCloses(1e-8),
            Invariants.planeNormalSpin(1e-8), Invariants.frameInvariant(1e-6));
    }
}
