package org.trundle.runner;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;

import com.fasterxml.jackson.databind.node.ObjectNode;
import org.trundle.contact.WallLoad;
import org.trundle.contact.WallLoads;
import org.trundle.core.BallState;
import org.trundle.core.RunEvent;
import org.trundle.core.RunObserver;
import org.trundle.core.RunResult;
import org.trundle.core.Sample;
import org.trundle.scenario.ScenarioFiles;
import org.trundle.scenario.Decimals;

/**
 * Writes {@code contacts.csv}, one row per sample and touching patch with a material (two rows for a sample
 * touching two such patches at once), and keeps per patch the largest
 * normal force and maximum pressure with their times (for {@code summary.json}); passes every call on to the
 * run's other observer. Columns: {@value #HEADER} (SI units; the last three give the ellipse's major axis,
 * world frame). The file is opened after the downstream observer has started (which creates the folder).
 */
final class ContactsCsv implements RunObserver {
    /** The header row. */
    static final String HEADER = "t,patch,mode,normal_force,friction_force,pressure_max,semi_axis_major,semi_axis_minor,"
        + "approach,major_axis_x,major_axis_y,major_axis_z";

    private final Path file;
    private final WallLoads loads;
    private final RunObserver next;
    private BufferedWriter out;
    private final Map<String, double[]> peaks = new LinkedHashMap<>();

    /**
     * @param file where to write
     * @param loads the wall-load calculator of the run's patches
     * @param next the observer to pass everything on to
     */
    ContactsCsv(Path file, WallLoads loads, RunObserver next) {
        this.file = file;
        this.loads = loads;
        this.next = next;
        for (String id : loads.patches()) {
            peaks.put(id, new double[] {0, Double.NaN, 0, Double.NaN});
        }
    }

    @Override
    public void start(BallState s) {
        next.start(s);
        try {
            out = Files.newBufferedWriter(file, StandardCharsets.UTF_8);
            out.write(HEADER);
            out.write('\n');
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    @Override
    public void sample(Sample s) {
        next.sample(s);
        if (out == null) {
            return;
        }
        for (WallLoad w : loads.loads(s)) {
            write(w);
        }
    }

    private void write(WallLoad w) {
        double[] p = peaks.get(w.patch());
        if (w.normalForce() > p[0]) {
            p[0] = w.normalForce();
            p[1] = w.time();
        }
        if (w.maxPressure() > p[2]) {
            p[2] = w.maxPressure();
            p[3] = w.time();
        }
        StringBuilder b = new StringBuilder(200);
        b.append(Decimals.shortest(w.time())).append(',').append(w.patch()).append(',').append(w.mode());
        for (double v : new double[] {w.normalForce(), w.frictionForce(), w.maxPressure(), w.semiMajor(), w.semiMinor(),
            w.approach(), w.majorAxis().getX(), w.majorAxis().getY(), w.majorAxis().getZ()}) {
            b.append(',').append(Decimals.shortest(v));
        }
        b.append('\n');
        try {
            out.write(b.toString());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    @Override
    public void event(RunEvent e) {
        next.event(e);
    }

    @Override
    public void finish(RunResult r) {
        next.finish(r);
        close();
    }

    /** Closes the file (also after a failed run). */
    void close() {
        if (out != null) {
            try {
                out.close();
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            } finally {
                out = null;
            }
        }
    }

    /**
     * @return {@code {patch: {max_normal_force, max_normal_force_time, max_pressure, max_pressure_time}}}; times are
     *     null for a patch never touched
     */
    ObjectNode summary() {
        ObjectNode o = ScenarioFiles.JSON.createObjectNode();
        for (Map.Entry<String, double[]> e : peaks.entrySet()) {
            double[] p = e.getValue();
            ObjectNode n = o.putObject(e.getKey());
            n.put("max_normal_force", p[0]);
            putTime(n, "max_normal_force_time", p[1]);
            n.put("max_pressure", p[2]);
            putTime(n, "max_pressure_time", p[3]);
        }
        return o;
    }

    private static void putTime(ObjectNode n, String key, double t) {
        if (Double.isNaN(t)) {
            n.putNull(key);
        } else {
            n.put(key, t);
        }
    }
}
