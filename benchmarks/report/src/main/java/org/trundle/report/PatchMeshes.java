package org.trundle.report;

import java.util.ArrayList;
import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.Box;
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
        if (d.size() == 0) {
            return new PatchMeshes(TriangleMesh.empty(), null);
        }
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
        Box box = Box.around(path, margin);
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
}
