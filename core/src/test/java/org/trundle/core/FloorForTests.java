package org.trundle.core;

/** A test-only horizontal floor z = 0, ball above, bounded to |x| ≤ halfWidth. */
public final class FloorForTests implements Surface {
    private final double halfWidth;

    public FloorForTests(double halfWidth) {
        this.halfWidth = halfWidth;
    }

    @Override
    public void query(double t, double[] x, ContactGeometry out) {
        out.point[0] = x[0];
        out.point[1] = x[1];
        out.point[2] = 0;
        out.normal[0] = 0;
        out.normal[1] = 0;
        out.normal[2] = 1;
        out.distance = x[2];
        java.util.Arrays.fill(out.hessian, 0.0);
        out.curvature1 = 0;
        out.curvature2 = 0;
        double lo = x[0] + halfWidth;
        double hi = halfWidth - x[0];
        out.setMargin(lo, 0, hi, 1);
    }

    @Override
    public boolean hasEdges() {
        return Double.isFinite(halfWidth);
    }

    @Override
    public String edgeName(int edge) {
        return edge == 0 ? "left" : "right";
    }

    @Override
    public double maxConcaveCurvature() {
        return 0;
    }

    @Override
    public String name() {
        return "test floor";
    }
}
