package org.trundle.core.check;

import java.util.ArrayList;
import java.util.List;

import org.trundle.core.ContactGeometry;
import org.trundle.core.Slab;
import org.trundle.core.Surface;

/**
 * A surface scaled by {@code λ} about the world origin: {@code d_λ(x) = λ d(x/λ)}, so the point
 * and the patch margin scale by {@code λ}, the normal is unchanged, the Hessian and the curvatures
 * scale by {@code 1/λ}. Kit-internal, used by the dimensional-scaling check; allocation-free.
 */
final class ScaledSurface implements Surface {
    private final Surface base;
    private final double lambda;

    ScaledSurface(Surface base, double lambda) {
        this.base = base;
        this.lambda = lambda;
    }

    /** Per-run workspace. */
    private static final class Work {
        final ContactGeometry inner = new ContactGeometry();
        final double[] x0 = new double[3];
    }

    @Override
    public Object newScratch() {
        Work w = new Work();
        w.inner.scratch = base.newScratch();
        return w;
    }

    @Override
    public void query(double t, double[] x, ContactGeometry out) {
        if (!(out.scratch instanceof Work)) {
            out.scratch = newScratch();
        }
        Work w = (Work) out.scratch;
        for (int i = 0; i < 3; i++) {
            w.x0[i] = x[i] / lambda;
        }
        ContactGeometry g = w.inner;
        base.query(t, w.x0, g);
        for (int i = 0; i < 3; i++) {
            out.point[i] = lambda * g.point[i];
            out.normal[i] = g.normal[i];
        }
        for (int i = 0; i < 9; i++) {
            out.hessian[i] = g.hessian[i] / lambda;
        }
        out.distance = lambda * g.distance;
        out.curvature1 = g.curvature1 / lambda;
        out.curvature2 = g.curvature2 / lambda;
        out.patchMargin = lambda * g.patchMargin;
        out.edge = g.edge;
    }

    /** The base surface's slabs, scaled by {@code λ} about the origin. */
    @Override
    public List<Slab> extent() {
        List<Slab> out = new ArrayList<>();
        for (Slab s : base.extent()) {
            out.add(new Slab(s.direction(), lambda * s.low(), lambda * s.high()));
        }
        return out;
    }

    @Override
    public String name() {
        return "scaled(" + lambda + ", " + base.name() + ")";
    }

    @Override
    public boolean hasEdges() {
        return base.hasEdges();
    }

    @Override
    public String edgeName(int edge) {
        return base.edgeName(edge);
    }

    @Override
    public double maxConcaveCurvature() {
        return base.maxConcaveCurvature() / lambda;
    }
}
