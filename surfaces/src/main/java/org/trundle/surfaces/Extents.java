package org.trundle.surfaces;

import java.util.ArrayList;
import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.Slab;

/**
 * Slabs holding a patch with an axis ({@link org.trundle.core.Surface#extent()}): an axial range
 * and a radial reach about the axis.
 */
final class Extents {
    private Extents() {
    }

    /**
     * The slab {@code o·a + from ≤ x·a ≤ o·a + to} along the axis and, when the radial reach is
     * finite, the two slabs {@code |(x − o)·e| ≤ reach} across it ({@code e} two directions
     * perpendicular to the axis and to each other).
     *
     * @param origin a point of the axis (m)
     * @param axis the unit axis
     * @param from lowest axial position of a patch point (m, may be −∞)
     * @param to highest axial position (m, may be +∞)
     * @param reach largest distance of a patch point from the axis (m, may be +∞)
     * @return the slabs
     */
    static List<Slab> aboutAxis(Vector3D origin, Vector3D axis, double from, double to, double reach) {
        List<Slab> out = new ArrayList<>(3);
        double at = origin.dotProduct(axis);
        out.add(new Slab(axis, at + from, at + to));
        if (Double.isFinite(reach)) {
            Vector3D e1 = axis.orthogonal();
            Vector3D e2 = Vector3D.crossProduct(axis, e1);
            out.add(Slab.about(e1, origin, reach, reach));
            out.add(Slab.about(e2, origin, reach, reach));
        }
        return List.copyOf(out);
    }
}
