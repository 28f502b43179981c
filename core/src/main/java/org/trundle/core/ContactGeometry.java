package org.trundle.core;

import java.util.Arrays;

/**
 * Output workspace of one {@link Surface#query} call: the contact geometry of a surface seen from
 * a query point {@code x} (the ball centre).
 *
 * <p>Fields (world frame, SI):
 * <ul>
 *   <li>{@link #point} — closest point {@code p} on the surface (m);</li>
 *   <li>{@link #normal} — unit normal {@code n} at {@code p}, pointing to the ball's side;</li>
 *   <li>{@link #distance} — signed distance {@code d = (x − p)·n} (m), positive on the ball's side;</li>
 *   <li>{@link #hessian} — {@code H = ∇²d(x) = ∇n} (1/m), symmetric, row-major 3×3; {@code n} is in
 *       its null space. With the surface's Weingarten map {@code W} at {@code p},
 *       {@code H = W (I + d W)⁻¹};</li>
 *   <li>{@link #curvature1}, {@link #curvature2} — principal curvatures at {@code p} (1/m), positive
 *       where the surface curves toward the ball (the inside of a tube of radius R has
 *       {@code 1/R}); {@code curvature1 ≥ curvature2};</li>
 *   <li>{@link #patchMargin} — signed distance (m) of the contact point from the patch edge, measured
 *       in the surface's own coordinates: positive inside the patch, zero on the edge;
 *       {@link Double#POSITIVE_INFINITY} for a patch without edges;</li>
 *   <li>{@link #edge} — index of the nearest edge (see {@link Surface#edgeName(int)});</li>
 *   <li>{@link #hint} — per-run scratch values a surface may keep between calls (for instance the
 *       curve parameter of the last closest point, to seed a Newton projection); {@link #hintValid}
 *       tells whether they hold anything; {@link #scratch} an object the surface made with
 *       {@link Surface#newScratch()}.</li>
 * </ul>
 *
 * <p>This is a mutable workspace, owned by one run and never shared between threads; surfaces
 * write into it so that queries allocate nothing.
 */
public final class ContactGeometry {
    /** Closest point p (m). */
    public final double[] point = new double[3];
    /** Unit normal n at p, toward the ball. */
    public final double[] normal = new double[3];
    /** Hessian of the signed distance at the query point (1/m), row-major. */
    public final double[] hessian = new double[9];
    /** Per-run seed values a surface may keep between calls. */
    public final double[] hint = new double[8];
    /** Signed distance d (m). */
    public double distance;
    /** Larger principal curvature at p (1/m), positive when concave toward the ball. */
    public double curvature1;
    /** Smaller principal curvature at p (1/m). */
    public double curvature2;
    /** Distance of the contact point from the patch edge (m), positive inside. */
    public double patchMargin = Double.POSITIVE_INFINITY;
    /** Index of the nearest patch edge. */
    public int edge;
    /** Whether {@link #hint} holds values from an earlier call of this run. */
    public boolean hintValid;
    /** Surface-specific per-run scratch object, or null. */
    public Object scratch;

    /** Creates an empty workspace. */
    public ContactGeometry() {
    }

    /**
     * Sets the Hessian from its six independent entries.
     *
     * @param hxx entry (0,0)
     * @param hxy entry (0,1)
     * @param hxz entry (0,2)
     * @param hyy entry (1,1)
     * @param hyz entry (1,2)
     * @param hzz entry (2,2)
     */
    public void setHessian(double hxx, double hxy, double hxz, double hyy, double hyz, double hzz) {
        hessian[0] = hxx;
        hessian[1] = hxy;
        hessian[2] = hxz;
        hessian[3] = hxy;
        hessian[4] = hyy;
        hessian[5] = hyz;
        hessian[6] = hxz;
        hessian[7] = hyz;
        hessian[8] = hzz;
    }

    /**
     * Sets the patch margin of a patch bounded on two opposite sides: the smaller of the two
     * distances (m) and the index of its edge (the lower bound wins a tie).
     *
     * @param lo distance from the lower edge (m)
     * @param loEdge index of the lower edge
     * @param hi distance from the upper edge (m)
     * @param hiEdge index of the upper edge
     */
    public void setMargin(double lo, int loEdge, double hi, int hiEdge) {
        if (lo <= hi) {
            patchMargin = lo;
            edge = loEdge;
        } else {
            patchMargin = hi;
            edge = hiEdge;
        }
    }

    /**
     * Narrows the patch margin to a further edge when that edge is nearer (strictly).
     *
     * @param margin distance from that edge (m)
     * @param index its index
     */
    public void tightenMargin(double margin, int index) {
        if (margin < patchMargin) {
            patchMargin = margin;
            edge = index;
        }
    }

    /** Forgets the per-run hint (for instance after a jump of the query point). */
    public void resetHint() {
        hintValid = false;
        Arrays.fill(hint, 0.0);
    }

    /**
     * Copies the geometric results (not the hint or scratch) from another workspace.
     *
     * @param o source
     */
    public void copyFrom(ContactGeometry o) {
        System.arraycopy(o.point, 0, point, 0, 3);
        System.arraycopy(o.normal, 0, normal, 0, 3);
        System.arraycopy(o.hessian, 0, hessian, 0, 9);
        distance = o.distance;
        curvature1 = o.curvature1;
        curvature2 = o.curvature2;
        patchMargin = o.patchMargin;
        edge = o.edge;
    }
}
