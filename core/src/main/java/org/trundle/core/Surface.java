package org.trundle.core;

import java.util.List;

/**
 * A rigid contact surface patch (the extension point for shapes).
 *
 * <p>For a query point {@code x} near the patch (the ball centre) an implementation writes into
 * the run's {@link ContactGeometry} workspace: the closest point {@code p}, the unit normal
 * {@code n} toward the ball, the signed distance {@code d = (x − p)·n}, the Hessian of the distance
 * field {@code H = ∇²d(x)}, the principal curvatures at {@code p} (positive where concave toward
 * the ball) and the signed patch margin (zero on the patch edge). The contact point of a ball of
 * radius {@code r} touching the surface is {@code p = c − r n}.
 *
 * <p>Contract:
 * <ul>
 *   <li>Implementations are immutable and thread-safe; any per-run cache (a Newton seed) lives in
 *       the workspace's {@link ContactGeometry#hint} or {@link ContactGeometry#scratch}.</li>
 *   <li>{@link #query} allocates nothing on the hot path and never returns non-finite values for a
 *       point within the surface's valid region; outside it, it throws
 *       {@link SurfaceDomainException}.</li>
 *   <li>{@code n} must equal the gradient of {@code d} and {@code H} its Hessian: the solver's
 *       constraint accelerations use {@code ṅ = H v}.</li>
 * </ul>
 * Sign conventions follow the design notes: {@code H = ∇n = ∇²d}; the inside of a tube of radius
 * {@code R} has principal curvature {@code +1/R}; a ball of radius {@code r} fits where
 * {@code r κ < 1}.
 */
public interface Surface {

    /**
     * Computes the contact geometry seen from point {@code (x, y, z)} at time {@code t}.
     *
     * @param t time (s); static surfaces ignore it
     * @param x query point, length-3 array (m), not modified
     * @param out workspace to fill (owned by the calling run)
     * @throws SurfaceDomainException when the point has no well-defined closest point
     */
    void query(double t, double[] x, ContactGeometry out);

    /** @return a short human-readable name with the main parameters, used in messages */
    String name();

    /**
     * @return whether the patch has edges (then {@link ContactGeometry#patchMargin} is finite and
     *     leaving the patch is an event)
     */
    default boolean hasEdges() {
        return false;
    }

    /**
     * @param edge edge index as written to {@link ContactGeometry#edge}
     * @return the edge's name (for instance {@code "from"} or {@code "to"} for an axial bound)
     */
    default String edgeName(int edge) {
        return "edge" + edge;
    }

    /**
     * Largest principal curvature (1/m) anywhere on the patch, for the fit check
     * {@code r κ_max < 1} at the start of a run; {@link Double#NaN} when it cannot be known in
     * advance (the solver then checks during the run, at each step); {@link Double#POSITIVE_INFINITY}
     * where the curvature has no bound on the patch (a cone's apex), so that no ball fits and every
     * simulation on it is refused.
     *
     * @return the largest concave curvature, 0 for a patch that is nowhere concave
     */
    default double maxConcaveCurvature() {
        return Double.NaN;
    }

    /**
     * Slabs that each hold the whole patch (every point a contact point can take on it), so that a
     * ball in flight whose path stays out of them, grown by its radius, can never meet the patch
     * again ({@link EndReason#LEFT_FOR_GOOD}). A slab may be open on one side, and a plane is a
     * slab of zero thickness. Empty, the default, when nothing is known: a flight then never ends
     * for leaving this patch.
     *
     * @return the slabs (m), at the surface's rest pose
     */
    default java.util.List<Slab> extent() {
        return java.util.List.of();
    }

    /**
     * @return a fresh per-run scratch object for {@link ContactGeometry#scratch}, or null
     */
    default Object newScratch() {
        return null;
    }

    /**
     * A triangle mesh of the patch, for pictures (never used by a run). A bounded patch gives its
     * real extent and ignores {@code extent}; where the patch is unbounded (a plane, an open axial
     * range, an implicit surface) the mesh covers the part of the patch that {@code extent} reaches
     * (at least its cross-section with the box; it may overhang the box). Every vertex lies on the
     * surface (to rounding, or to the surface's own projection tolerance).
     *
     * <p>This default says the surface cannot draw itself; every surface of {@code trundle-surfaces}
     * overrides it.
     *
     * @param extent the region to draw where the patch is unbounded (world frame, m)
     * @param resolution number of mesh cells along each patch coordinate (at least 2; an implicit
     *     surface uses it along the box's longest side)
     * @return the mesh (possibly empty when the patch does not reach {@code extent})
     * @throws UnsupportedOperationException when the surface cannot give a mesh
     */
    default TriangleMesh mesh(Box extent, int resolution) {
        throw new UnsupportedOperationException("surface " + name() + " gives no mesh (its class "
            + getClass().getName() + " does not override Surface.mesh)");
    }

    /**
     * The surface's natural coordinates (names of our own, snake_case, with units): for a tube
     * the axial position and the angle round the axis, for a sphere the polar angle and azimuth,
     * and so on (see each surface's Javadoc). Empty by default: the surface names none.
     *
     * @return the coordinates, in the order {@link #coordinatesAt} writes them
     */
    default List<SurfaceCoordinate> coordinates() {
        return List.of();
    }

    /**
     * The natural coordinates of the closest point {@code p} of {@code x} on the surface (for a
     * ball centre, of its contact point). Not for the hot path: it may run a closest-point query.
     *
     * @param t time (s)
     * @param x query point, length-3 array (m), within the surface's valid region
     * @param work a workspace (one per caller and thread; its hint seeds the next call)
     * @param out receives {@code coordinates().size()} values, in the units of {@link #coordinates()}
     * @throws UnsupportedOperationException when the surface names no coordinates
     * @throws SurfaceDomainException when the point has no well-defined closest point
     */
    default void coordinatesAt(double t, double[] x, ContactGeometry work, double[] out) {
        throw new UnsupportedOperationException("surface " + name() + " names no coordinates");
    }
}
