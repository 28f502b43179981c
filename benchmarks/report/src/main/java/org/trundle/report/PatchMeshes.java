package org.trundle.report;

import java.util.ArrayList;
import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.Box;
import org.trundle.core.MotionState;
import org.trundle.core.Patch;
import org.trundle.core.Surface;
import org.trundle.core.TriangleMesh;

/**
 * The surface's mesh for a picture, from {@link Surface#mesh(Box, int)}: a bounded patch at its real
 * extent; an unbounded one cut to a box around the centre path, grown by a third of the path's
 * largest extent (at least 5 ball radii) on every side.
 *
 * @param mesh the mesh (empty when the surface gives none)
 * @param note what the picture should say about it: how an unbounded patch was cut, or why there is
 *     no mesh; null when there is nothing to say
 */
record PatchMeshes(TriangleMesh mesh, String note) {
    /** Mesh cells along each patch coordinate in run.png (a picture 900 px wide needs no more). */
    static final int PICTURE_RESOLUTION = 24;
    /** Mesh cells along each patch coordinate in report.html (the view can zoom). */
    static final int VIEW_RESOLUTION = 48;

    /**
     * @param surface the surface
     * @param d the recorded samples (the path)
     * @param ballRadius ball radius (m), for the least margin
     * @param resolution mesh cells along each patch coordinate
     * @return the mesh and its note
     */
    static PatchMeshes of(Surface surface, SampleDigest d, double ballRadius, int resolution) {
        return of(List.of(Patch.of(org.trundle.core.Simulation.SINGLE_PATCH, surface)), d, ballRadius, resolution);
    }

    /**
     * The meshes of every patch of a scene, merged into one mesh: each patch as {@link #of(Surface,
     * SampleDigest, double, int)} cuts it, a moving patch at its pose at the first sample's time
     * ({@code x = R x₀ + D}).
     *
     * @param patches the scene's patches
     * @param d the recorded samples (the path)
     * @param ballRadius ball radius (m), for the least margin
     * @param resolution mesh cells along each patch coordinate
     * @return the merged mesh and its note
     */
    static PatchMeshes of(List<Patch> patches, SampleDigest d, double ballRadius, int resolution) {
        if (d.size() == 0) {
            return new PatchMeshes(TriangleMesh.empty(), null);
        }
        Box box = boxAround(d, ballRadius);
        double t0 = d.get(0, SampleDigest.Column.T);
        if (patches.size() == 1) {
            return moved(one(patches.get(0).surface(), box, resolution), patches.get(0), t0);
        }
        List<TriangleMesh> meshes = new ArrayList<>();
        StringBuilder note = new StringBuilder();
        for (Patch p : patches) {
            PatchMeshes m = moved(one(p.surface(), box, resolution), p, t0);
            meshes.add(m.mesh());
            note.append(note.length() == 0 ? "" : "; ").append(p.id()).append(": ")
                .append(m.note() != null ? m.note() : m.mesh().triangleCount() + " triangles");
        }
        return new PatchMeshes(merge(meshes), patches.size() + " patches (" + note + ")");
    }

    /** The box around the centre path, grown by a third of its largest extent, at least 5 ball radii. */
    private static Box boxAround(SampleDigest d, double ballRadius) {
        List<Vector3D> path = new ArrayList<>(d.size());
        double[] lo = {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY};
        double[] hi = {Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY};
        for (int i = 0; i < d.size(); i++) {
            double[] c = {d.get(i, SampleDigest.Column.X), d.get(i, SampleDigest.Column.Y), d.get(i, SampleDigest.Column.Z)};
            path.add(new Vector3D(c[0], c[1], c[2]));
            for (int k = 0; k < 3; k++) {
                lo[k] = Math.min(lo[k], c[k]);
                hi[k] = Math.max(hi[k], c[k]);
            }
        }
        double extent = Math.max(Math.max(hi[0] - lo[0], hi[1] - lo[1]), hi[2] - lo[2]);
        double margin = Math.max(extent / 3, 5 * ballRadius);
        margin = margin > 0 ? margin : 1e-3;
        return Box.around(path, margin);
    }

    /** One surface's mesh in the box, with its note. */
    private static PatchMeshes one(Surface surface, Box box, int resolution) {
        try {
            TriangleMesh m = surface.mesh(box, resolution);
            String note = m.isEmpty() ? "the surface does not reach the box around the path"
                : surface.hasEdges() ? null : "surface cut to a box around the path (it has no edges)";
            return new PatchMeshes(m, note);
        } catch (UnsupportedOperationException e) {
            return new PatchMeshes(TriangleMesh.empty(), "surface " + surface.name() + " gives no mesh");
        } catch (RuntimeException e) {
            return new PatchMeshes(TriangleMesh.empty(), "no mesh: " + e.getMessage());
        }
    }

    /**
     * A moving patch's mesh at its pose at time t ({@code x = R x₀ + D}, {@link MotionState}); a still one as
     * it is. (The mesh is cut from the rest pose's box, so a patch that moves far may be cut short.)
     */
    private static PatchMeshes moved(PatchMeshes m, Patch p, double t) {
        if (p.motion().stationary() || m.mesh().isEmpty()) {
            return m;
        }
        MotionState pose = new MotionState();
        p.motion().at(t, pose);
        double[] r = pose.rotation;
        double[] dd = pose.offset;
        double[] v = m.mesh().vertices();
        for (int i = 0; i < v.length; i += 3) {
            double x = v[i];
            double y = v[i + 1];
            double z = v[i + 2];
            v[i] = r[0] * x + r[1] * y + r[2] * z + dd[0];
            v[i + 1] = r[3] * x + r[4] * y + r[5] * z + dd[1];
            v[i + 2] = r[6] * x + r[7] * y + r[8] * z + dd[2];
        }
        String note = (m.note() != null ? m.note() + "; " : "") + "moving: drawn at its start pose";
        return new PatchMeshes(TriangleMesh.of(v, m.mesh().triangles()), note);
    }

    /** The meshes as one (vertices appended, triangle corners shifted). */
    private static TriangleMesh merge(List<TriangleMesh> meshes) {
        int nv = 0;
        int nt = 0;
        for (TriangleMesh m : meshes) {
            nv += m.vertexCount();
            nt += m.triangleCount();
        }
        if (nt == 0) {
            return TriangleMesh.empty();
        }
        double[] v = new double[3 * nv];
        int[] t = new int[3 * nt];
        int vo = 0;
        int to = 0;
        for (TriangleMesh m : meshes) {
            System.arraycopy(m.vertices(), 0, v, 3 * vo, 3 * m.vertexCount());
            int[] mt = m.triangles();
            for (int i = 0; i < mt.length; i++) {
                t[to + i] = mt[i] + vo;
            }
            vo += m.vertexCount();
            to += mt.length;
        }
        return TriangleMesh.of(v, t);
    }
}
