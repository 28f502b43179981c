package org.trundle.report;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.BallState;
import org.trundle.core.ContactGeometry;
import org.trundle.core.RunEvent;
import org.trundle.core.RunObserver;
import org.trundle.core.RunResult;
import org.trundle.core.Sample;
import org.trundle.core.Surface;
import org.trundle.core.SurfaceCoordinate;

/**
 * Streams a run's samples to {@code trajectory.csv} and keeps what the pictures and the summary
 * need: a bounded {@link SampleDigest} of the samples (memory fixed in run length) and the events. The file is opened when the library reports the validated start, so nothing is written for
 * a start the library refuses.
 *
 * <p>Columns: {@code t,x,y,z,vx,vy,vz,wx,wy,wz,phase,normal_force,friction_force} (s, m, m/s, rad/s,
 * phase label, N, N: the magnitude of the tangential contact force), then {@code qw,qx,qy,qz} (the
 * body-to-world orientation quaternion), {@code contact_x,contact_y,contact_z} (contact point, m,
 * empty in flight), {@code speed} (m/s), {@code height} (m, along {@code −g}), {@code contacts} (the ids of
 * the patches touched joined by {@code +}, empty in flight) and {@code event} (the
 * kinds of the events at that instant joined by {@code ;}, plus {@code start} and {@code end}),
 * then, when a surface is given, its natural coordinates at the closest point to the centre, one
 * column each, named {@code wall_<name>_<unit>} ({@link #header()}; empty where the surface has no
 * closest point).
 * Rows come at the sample interval and at every event instant; numbers are written exactly
 * (shortest decimal that reads back to the same double).
 */
public final class RunRecorder implements RunObserver {
    /** The fixed leading columns of trajectory.csv. */
    public static final String HEADER = "t,x,y,z,vx,vy,vz,wx,wy,wz,phase,normal_force,friction_force";
    /** The columns after them. */
    public static final String EXTRA = "qw,qx,qy,qz,contact_x,contact_y,contact_z,speed,height,contacts,event";

    /** An output step that may fail with an I/O error. */
    @FunctionalInterface
    public interface IoAction {
        void run() throws IOException;
    }

    private final Path csvFile;
    private final Vector3D up;
    private final IoAction beforeStart;
    private final Surface surface;
    private final List<SurfaceCoordinate> coordinates;
    private final ContactGeometry work = new ContactGeometry();
    private final double[] coordinateValues;
    private final double[] point = new double[3];
    private BufferedWriter csv;
    private String pendingRow;
    private double pendingTime;
    private String pendingLabel = "";
    private String pendingCoordinates = "";
    private boolean first = true;

    /** Most buckets the picture's digest keeps (between half and all of them are in use). */
    public static final int DIGEST_CAPACITY = 4096;

    final SampleDigest digest = new SampleDigest(DIGEST_CAPACITY);
    private final double[] digestRow = SampleDigest.newRow();
    final List<RunEvent> events = new ArrayList<>();
    BallState start;
    RunResult result;
    BallState last;

    /**
     * @param csvFile where to write the trajectory, or null for none
     * @param up unit "up" direction for the height column (opposite to gravity)
     * @param beforeStart called when the library reports the validated start, before any output
     */
    public RunRecorder(Path csvFile, Vector3D up, IoAction beforeStart) {
        this(csvFile, up, beforeStart, null);
    }

    /**
     * @param csvFile where to write the trajectory, or null for none
     * @param up unit "up" direction for the height column (opposite to gravity)
     * @param beforeStart called when the library reports the validated start, before any output
     * @param surface the run's surface, whose natural coordinates become extra columns, or null for none
     */
    public RunRecorder(Path csvFile, Vector3D up, IoAction beforeStart, Surface surface) {
        this.csvFile = csvFile;
        this.up = up;
        this.beforeStart = beforeStart;
        this.surface = surface;
        this.coordinates = surface == null ? List.of() : surface.coordinates();
        this.coordinateValues = new double[coordinates.size()];
        work.scratch = surface == null ? null : surface.newScratch();
    }

    /**
     * The header of trajectory.csv: {@link #HEADER}, {@link #EXTRA}, then one column per natural
     * coordinate of the surface, named {@code wall_<name>_<unit>} (for instance
     * {@code wall_axial_m, wall_azimuth_rad}).
     *
     * @return the header line, without the line end
     */
    public String header() {
        StringBuilder b = new StringBuilder(HEADER).append(',').append(EXTRA);
        for (SurfaceCoordinate c : coordinates) {
            b.append(',').append(columnName(c));
        }
        return b.toString();
    }

    /**
     * @param c a surface coordinate
     * @return its trajectory.csv column name, {@code wall_<name>_<unit>}
     */
    public static String columnName(SurfaceCoordinate c) {
        return "wall_" + c.name() + "_" + c.unit();
    }

    /**
     * @return axis titles with units for the first two surface coordinates (for the unrolled wall),
     *     or null when the surface names fewer than two
     */
    public String[] coordinateTitles() {
        if (coordinates.size() < 2) {
            return null;
        }
        return new String[] {title(coordinates.get(0)), title(coordinates.get(1))};
    }

    /** @return the surface's natural coordinates written as the last columns (possibly none) */
    public List<SurfaceCoordinate> coordinates() {
        return coordinates;
    }

    private static String title(SurfaceCoordinate c) {
        return c.name().replace('_', ' ') + " (" + c.unit() + ")";
    }

    @Override
    public void start(BallState s) {
        start = s;
        if (csvFile != null) {
            try {
                beforeStart.run();
                Files.createDirectories(csvFile.getParent());
                csv = Files.newBufferedWriter(csvFile, StandardCharsets.UTF_8);
                csv.write(header() + "\n");
            } catch (IOException e) {
                throw new UncheckedIOException("cannot write " + csvFile, e);
            }
        }
    }

    @Override
    public void sample(Sample s) {
        BallState st = s.state();
        surfaceCoordinates(s);
        String row = row(s);
        if (pendingRow != null && pendingTime == s.time() && pendingRow.equals(row)) {
            return; // the same instant reported twice (an event that also ends the run)
        }
        flushPending();
        pendingRow = row;
        pendingCoordinates = coordinateCells();
        pendingTime = s.time();
        pendingLabel = first ? "start" : "";
        first = false;
        last = st;
        digest(s);
    }

    private void digest(Sample s) {
        BallState st = s.state();
        Vector3D c = st.centre();
        Rotation q = st.orientation();
        double[] r = digestRow;
        r[SampleDigest.Column.T.ordinal()] = s.time();
        r[SampleDigest.Column.X.ordinal()] = c.getX();
        r[SampleDigest.Column.Y.ordinal()] = c.getY();
        r[SampleDigest.Column.Z.ordinal()] = c.getZ();
        r[SampleDigest.Column.HEIGHT.ordinal()] = c.dotProduct(up);
        r[SampleDigest.Column.SPEED.ordinal()] = st.velocity().getNorm();
        r[SampleDigest.Column.NORMAL.ordinal()] = s.normalForce();
        r[SampleDigest.Column.FRICTION.ordinal()] = s.frictionForce().getNorm();
        r[SampleDigest.Column.QW.ordinal()] = q.getQ0();
        r[SampleDigest.Column.QX.ordinal()] = q.getQ1();
        r[SampleDigest.Column.QY.ordinal()] = q.getQ2();
        r[SampleDigest.Column.QZ.ordinal()] = q.getQ3();
        r[SampleDigest.Column.PHASE.ordinal()] = st.phase().ordinal();
        r[SampleDigest.Column.U.ordinal()] = coordinateValues.length > 1 ? coordinateValues[0] : Double.NaN;
        r[SampleDigest.Column.V.ordinal()] = coordinateValues.length > 1 ? coordinateValues[1] : Double.NaN;
        digest.add(r);
    }

    /** @return the bounded reduction of the samples recorded so far (for pictures) */
    public SampleDigest digest() {
        return digest;
    }

    /** @return the run's result, or null when the library reported none */
    public RunResult result() {
        return result;
    }

    @Override
    public void event(RunEvent e) {
        events.add(e);
        if (pendingRow != null && pendingTime == e.time()) {
            pendingLabel = pendingLabel.isEmpty() ? e.kind().label() : pendingLabel + ";" + e.kind().label();
        }
    }

    @Override
    public void finish(RunResult r) {
        result = r;
        close();
    }

    /** @return the validated start the library reported, or null if the run never started */
    public BallState validatedStart() {
        return start;
    }

    /** @return the state of the last sample or event recorded, or null if none */
    public BallState lastState() {
        return last;
    }

    /** @return the events recorded so far, in order (a read-only view) */
    public List<RunEvent> events() {
        return java.util.Collections.unmodifiableList(events);
    }

    /** Writes the last row (labelled {@code end}) and closes the file; safe to call twice. */
    public void close() {
        if (pendingRow != null) {
            pendingLabel = pendingLabel.isEmpty() ? "end" : pendingLabel + ";end";
        }
        flushPending();
        if (csv != null) {
            try {
                csv.close();
            } catch (IOException e) {
                throw new UncheckedIOException("cannot write " + csvFile, e);
            }
            csv = null;
        }
    }

    /** Fills {@link #coordinateValues} for the sample (NaN where the surface has no closest point). */
    private void surfaceCoordinates(Sample s) {
        if (coordinateValues.length == 0) {
            return;
        }
        Vector3D c = s.state().centre();
        point[0] = c.getX();
        point[1] = c.getY();
        point[2] = c.getZ();
        try {
            surface.coordinatesAt(s.time(), point, work, coordinateValues);
        } catch (RuntimeException e) {
            java.util.Arrays.fill(coordinateValues, Double.NaN);
        }
    }

    private void flushPending() {
        if (pendingRow == null) {
            return;
        }
        if (csv != null) {
            try {
                csv.write(pendingRow);
                csv.write(pendingLabel);
                csv.write(pendingCoordinates);
                csv.write('\n');
            } catch (IOException e) {
                throw new UncheckedIOException("cannot write " + csvFile, e);
            }
        }
        pendingRow = null;
    }

    private String coordinateCells() {
        if (coordinateValues.length == 0) {
            return "";
        }
        StringBuilder b = new StringBuilder(24 * coordinateValues.length);
        for (double v : coordinateValues) {
            b.append(',');
            if (Double.isFinite(v)) {
                b.append(v);
            }
        }
        return b.toString();
    }

    private String row(Sample s) {
        BallState st = s.state();
        StringBuilder b = new StringBuilder(320);
        b.append(s.time()).append(',');
        vec(b, st.centre());
        vec(b, st.velocity());
        vec(b, st.spin());
        b.append(st.phase().label()).append(',');
        b.append(s.normalForce()).append(',').append(s.frictionForce().getNorm()).append(',');
        Rotation q = st.orientation();
        b.append(q.getQ0()).append(',').append(q.getQ1()).append(',').append(q.getQ2()).append(',').append(q.getQ3())
            .append(',');
        if (s.contactPoint() != null) {
            vec(b, s.contactPoint());
        } else {
            b.append(",,,");
        }
        b.append(st.velocity().getNorm()).append(',').append(st.centre().dotProduct(up)).append(',');
        b.append(String.join("+", s.contacts())).append(',');
        return b.toString();
    }

    private static void vec(StringBuilder b, Vector3D v) {
        b.append(v.getX()).append(',').append(v.getY()).append(',').append(v.getZ()).append(',');
    }
}
