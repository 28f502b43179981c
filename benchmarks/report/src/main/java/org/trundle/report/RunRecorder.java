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
import org.trundle.core.Phase;
import org.trundle.core.RunEvent;
import org.trundle.core.RunObserver;
import org.trundle.core.RunResult;
import org.trundle.core.Sample;

/**
 * Streams a run's samples to {@code trajectory.csv} and keeps what the picture and the summary
 * need. The file is opened when the library reports the validated start, so nothing is written for
 * a start the library refuses.
 *
 * <p>Columns: {@code t,x,y,z,vx,vy,vz,wx,wy,wz,phase,normal_force,friction_force} (s, m, m/s, rad/s,
 * phase label, N, N: the magnitude of the tangential contact force), then {@code qw,qx,qy,qz} (the
 * body-to-world orientation quaternion), {@code contact_x,contact_y,contact_z} (contact point, m,
 * empty in flight), {@code speed} (m/s), {@code height} (m, along {@code −g}), {@code contacts} (the ids of
 * the patches touched joined by {@code +}, empty in flight) and {@code event} (the
 * kinds of the events at that instant joined by {@code ;}, plus {@code start} and {@code end}).
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
    private BufferedWriter csv;
    private String pendingRow;
    private double pendingTime;
    private String pendingLabel = "";
    private boolean first = true;

    final DoubleSeries time = new DoubleSeries();
    final DoubleSeries height = new DoubleSeries();
    final DoubleSeries speed = new DoubleSeries();
    final DoubleSeries normalForce = new DoubleSeries();
    final DoubleSeries frictionForce = new DoubleSeries();
    final DoubleSeries x = new DoubleSeries();
    final DoubleSeries y = new DoubleSeries();
    final DoubleSeries z = new DoubleSeries();
    final List<Phase> phases = new ArrayList<>();
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
        this.csvFile = csvFile;
        this.up = up;
        this.beforeStart = beforeStart;
    }

    @Override
    public void start(BallState s) {
        start = s;
        if (csvFile != null) {
            try {
                beforeStart.run();
                Files.createDirectories(csvFile.getParent());
                csv = Files.newBufferedWriter(csvFile, StandardCharsets.UTF_8);
                csv.write(HEADER + "," + EXTRA + "\n");
            } catch (IOException e) {
                throw new UncheckedIOException("cannot write " + csvFile, e);
            }
        }
    }

    @Override
    public void sample(Sample s) {
        BallState st = s.state();
        String row = row(s);
        if (pendingRow != null && pendingTime == s.time() && pendingRow.equals(row)) {
            return; // the same instant reported twice (an event that also ends the run)
        }
        flushPending();
        pendingRow = row;
        pendingTime = s.time();
        pendingLabel = first ? "start" : "";
        first = false;
        last = st;
        Vector3D c = st.centre();
        time.add(s.time());
        height.add(c.dotProduct(up));
        speed.add(st.velocity().getNorm());
        normalForce.add(s.normalForce());
        frictionForce.add(s.frictionForce().getNorm());
        x.add(c.getX());
        y.add(c.getY());
        z.add(c.getZ());
        phases.add(st.phase());
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

    private void flushPending() {
        if (pendingRow == null) {
            return;
        }
        if (csv != null) {
            try {
                csv.write(pendingRow);
                csv.write(pendingLabel);
                csv.write('\n');
            } catch (IOException e) {
                throw new UncheckedIOException("cannot write " + csvFile, e);
            }
        }
        pendingRow = null;
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
