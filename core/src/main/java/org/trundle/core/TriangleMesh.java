package org.trundle.core;

import org.trundle.core.internal.Checks;

import java.util.Arrays;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;

/**
 * An immutable triangle mesh for pictures: vertex coordinates (m, world frame unless stated) and
 * triangles as triples of vertex indices. Surfaces give one of their patch through
 * {@link Surface#mesh(Box, int)}; it never enters a run (the solver queries the exact surface).
 *
 * <p>Triangle winding is not specified: draw both faces. Degenerate triangles (two equal indices)
 * are never stored; a triangle may still have a tiny area where a patch closes on a pole.
 */
public final class TriangleMesh {
    private static final TriangleMesh EMPTY = new TriangleMesh(new double[0], new int[0]);

    private final double[] xyz;
    private final int[] tri;

    private TriangleMesh(double[] xyz, int[] tri) {
        this.xyz = xyz;
        this.tri = tri;
    }

    /**
     * @param vertices vertex coordinates {@code x0, y0, z0, x1, …} (m), finite, length a multiple of 3
     * @param triangles vertex indices, three per triangle, each in range
     * @return a mesh holding copies of both arrays
     */
    public static TriangleMesh of(double[] vertices, int[] triangles) {
        if (vertices == null || triangles == null) {
            throw new IllegalArgumentException("mesh vertices and triangles must be given, got "
                + (vertices == null ? "null" : "an array") + " and " + (triangles == null ? "null" : "an array"));
        }
        if (vertices.length % 3 != 0 || triangles.length % 3 != 0) {
            throw new IllegalArgumentException("mesh arrays must hold triples, got " + vertices.length
                + " vertex coordinates and " + triangles.length + " triangle indices");
        }
        for (int i = 0; i < vertices.length; i++) {
            if (!Double.isFinite(vertices[i])) {
                throw new IllegalArgumentException("mesh vertex " + i / 3 + " must be finite, got coordinate " + vertices[i]);
            }
        }
        int n = vertices.length / 3;
        for (int i = 0; i < triangles.length; i++) {
            if (triangles[i] < 0 || triangles[i] >= n) {
                throw new IllegalArgumentException("mesh triangle " + i / 3 + " refers to vertex " + triangles[i]
                    + ", outside 0.." + (n - 1));
            }
        }
        return new TriangleMesh(vertices.clone(), triangles.clone());
    }

    /** @return the mesh without vertices or triangles (a patch that does not reach the requested box) */
    public static TriangleMesh empty() {
        return EMPTY;
    }

    /** @return the number of vertices */
    public int vertexCount() {
        return xyz.length / 3;
    }

    /** @return the number of triangles */
    public int triangleCount() {
        return tri.length / 3;
    }

    /** @return whether the mesh has no triangles */
    public boolean isEmpty() {
        return tri.length == 0;
    }

    /**
     * @param i vertex index
     * @return the vertex (m)
     */
    public Vector3D vertex(int i) {
        return new Vector3D(xyz[3 * i], xyz[3 * i + 1], xyz[3 * i + 2]);
    }

    /**
     * @param i vertex index
     * @param axis 0, 1 or 2 for x, y, z
     * @return that coordinate of the vertex (m)
     */
    public double coordinate(int i, int axis) {
        return xyz[3 * i + axis];
    }

    /**
     * @param t triangle index
     * @param corner 0, 1 or 2
     * @return the vertex index of that corner
     */
    public int corner(int t, int corner) {
        return tri[3 * t + corner];
    }

    /** @return a copy of the vertex coordinates {@code x0, y0, z0, x1, …} (m) */
    public double[] vertices() {
        return xyz.clone();
    }

    /** @return a copy of the triangle vertex indices, three per triangle */
    public int[] triangles() {
        return tri.clone();
    }

    /**
     * The mesh moved rigidly: each vertex {@code x} becomes {@code Q x + t}.
     *
     * @param rotation the rotation Q, applied as {@link Rotation#applyTo(Vector3D)}
     * @param translation the translation t (m)
     * @return the moved mesh (same triangles)
     */
    public TriangleMesh transformed(Rotation rotation, Vector3D translation) {
        if (rotation == null) {
            throw new IllegalArgumentException("rotation must be given, got null");
        }
        Checks.finite("translation", translation);
        Vector3D c0 = rotation.applyTo(Vector3D.PLUS_I);
        Vector3D c1 = rotation.applyTo(Vector3D.PLUS_J);
        Vector3D c2 = rotation.applyTo(Vector3D.PLUS_K);
        double[] out = new double[xyz.length];
        for (int i = 0; i < xyz.length; i += 3) {
            double x = xyz[i];
            double y = xyz[i + 1];
            double z = xyz[i + 2];
            out[i] = c0.getX() * x + c1.getX() * y + c2.getX() * z + translation.getX();
            out[i + 1] = c0.getY() * x + c1.getY() * y + c2.getY() * z + translation.getY();
            out[i + 2] = c0.getZ() * x + c1.getZ() * y + c2.getZ() * z + translation.getZ();
        }
        return new TriangleMesh(out, tri);
    }

    /**
     * The sub-mesh of the triangles whose three vertices pass a test (unused vertices dropped).
     *
     * @param keep the vertex test, given the vertex coordinates (m)
     * @return the kept triangles with their vertices
     */
    public TriangleMesh keep(java.util.function.Predicate<Vector3D> keep) {
        boolean[] in = new boolean[vertexCount()];
        for (int i = 0; i < in.length; i++) {
            in[i] = keep.test(vertex(i));
        }
        int[] map = new int[in.length];
        Arrays.fill(map, -1);
        int[] t = new int[tri.length];
        int nt = 0;
        int nv = 0;
        double[] v = new double[xyz.length];
        for (int k = 0; k < tri.length; k += 3) {
            if (in[tri[k]] && in[tri[k + 1]] && in[tri[k + 2]]) {
                for (int c = 0; c < 3; c++) {
                    int old = tri[k + c];
                    if (map[old] < 0) {
                        map[old] = nv;
                        System.arraycopy(xyz, 3 * old, v, 3 * nv, 3);
                        nv++;
                    }
                    t[nt++] = map[old];
                }
            }
        }
        return new TriangleMesh(Arrays.copyOf(v, 3 * nv), Arrays.copyOf(t, nt));
    }

    @Override
    public String toString() {
        return "TriangleMesh(" + vertexCount() + " vertices, " + triangleCount() + " triangles)";
    }
}
