package org.trundle.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.RotationConvention;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.trundle.core.Patch;
import org.trundle.core.SurfaceMotion;
import org.trundle.core.TriangleMesh;
import org.trundle.surfaces.Cylinder;
import org.trundle.surfaces.Plane;

/**
 * A scene's picture draws every patch: the merged mesh holds each patch's triangles, and a moving patch is drawn
 * at its pose at the first sample, {@code x = R x₀ + D}; the reference pose comes from Hipparchus' own
 * {@link Rotation} about the motion's axis (a general-purpose library), not from the motion's matrix.
 */
class PatchMeshesTest {
    private static SampleDigest path(double t0) {
        SampleDigest d = new SampleDigest(64);
        for (int i = 0; i < 10; i++) {
            double[] r = SampleDigest.newRow();
            r[SampleDigest.Column.T.ordinal()] = t0 + i * 0.01;
            r[SampleDigest.Column.X.ordinal()] = 0.01 * i;
            r[SampleDigest.Column.Z.ordinal()] = 0.02;
            d.add(r);
        }
        return d;
    }

    @Test
    void everyPatchIsDrawnAndAMovingOneAtItsStartPose() {
        double t0 = 0.25;
        double rate = 2.0;
        Vector3D origin = new Vector3D(0.05, 0, 0);
        Cylinder tube = new Cylinder(Vector3D.ZERO, Vector3D.PLUS_I, 0.015, org.trundle.surfaces.Side.INSIDE, -0.1, 0.0);
        Plane table = new Plane(new Vector3D(0, 0, -0.1), Vector3D.PLUS_K);
        Patch still = Patch.of("tube", tube);
        Patch turning = Patch.of("table", table).withMotion(SurfaceMotion.rotation(Vector3D.PLUS_K, origin, rate));
        SampleDigest d = path(t0);
        PatchMeshes one = PatchMeshes.of(List.of(still), d, 0.004, 12);
        PatchMeshes restTable = PatchMeshes.of(List.of(Patch.of("table", table)), d, 0.004, 12);
        PatchMeshes both = PatchMeshes.of(List.of(still, turning), d, 0.004, 12);
        TriangleMesh m = both.mesh();
        assertEquals(one.mesh().triangleCount() + restTable.mesh().triangleCount(), m.triangleCount());
        assertTrue(both.note().startsWith("2 patches"), both.note());
        assertTrue(both.note().contains("table") && both.note().contains("moving"), both.note());
        // the table's vertices follow the tube's, turned by rate·t0 about the axis through the origin
        Rotation turn = new Rotation(Vector3D.PLUS_K, rate * t0, RotationConvention.VECTOR_OPERATOR);
        int base = one.mesh().vertexCount();
        TriangleMesh rest = restTable.mesh();
        for (int i = 0; i < rest.vertexCount(); i += 17) {
            Vector3D expected = origin.add(turn.applyTo(rest.vertex(i).subtract(origin)));
            assertEquals(0.0, expected.distance(m.vertex(base + i)), 1e-15, "vertex " + i);
        }
    }
}
