package org.trundle.core.engine;

/** Small 3-vector helpers on arrays, allocation-free. */
final class Vec {
    private Vec() {
    }

    static double dot(double[] a, double[] b) {
        return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
    }

    static double norm(double[] a) {
        return Math.sqrt(dot(a, a));
    }

    static void cross(double[] a, double[] b, double[] out) {
        double x = a[1] * b[2] - a[2] * b[1];
        double y = a[2] * b[0] - a[0] * b[2];
        double z = a[0] * b[1] - a[1] * b[0];
        out[0] = x;
        out[1] = y;
        out[2] = z;
    }

    static void scale(double[] a, double s) {
        a[0] *= s;
        a[1] *= s;
        a[2] *= s;
    }

    static void zero(double[] a) {
        a[0] = 0;
        a[1] = 0;
        a[2] = 0;
    }

    /** {@code out = h v} for a row-major 3×3 {@code h}. */
    static void mulSym(double[] h, double[] v, double[] out) {
        out[0] = h[0] * v[0] + h[1] * v[1] + h[2] * v[2];
        out[1] = h[3] * v[0] + h[4] * v[1] + h[5] * v[2];
        out[2] = h[6] * v[0] + h[7] * v[1] + h[8] * v[2];
    }

    /** Whether every element of {@code a} is finite. */
    static boolean allFinite(double[] a) {
        for (double x : a) {
            if (!Double.isFinite(x)) {
                return false;
            }
        }
        return true;
    }
}
