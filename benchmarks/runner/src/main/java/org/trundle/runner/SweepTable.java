package org.trundle.runner;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.function.Consumer;

import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.RunEvent;
import org.trundle.core.RunResult;
import org.trundle.core.sweep.SweepRun;
import org.trundle.scenario.Outcome;

/**
 * Streams {@code sweep.csv}: one row per run, in index order. Columns: {@code index}, the
 * parameters (by their dotted paths), {@code outcome} ({@link Outcome}), {@code end_reason},
 * {@code exit_edge}, {@code end_time} (s), {@code exit_time} (s), {@code exit_x,exit_y,exit_z} (m),
 * {@code exit_vx,exit_vy,exit_vz} (m/s), {@code exit_speed} (m/s), {@code end_x,end_y,end_z} (m),
 * {@code events} (count), {@code message} (failure reason, quoted). Exit columns are empty when the
 * ball did not leave the patch. Numbers are exact (shortest round-trip decimals; the parameters
 * through {@link Decimals#shortest}).
 */
final class SweepTable implements Consumer<SweepRun>, AutoCloseable {
    private final BufferedWriter out;
    private final Path file;

    /**
     * @param file the CSV file
     * @param names parameter names
     * @throws IOException when it cannot be created
     */
    SweepTable(Path file, List<String> names) throws IOException {
        this.file = file;
        out = Files.newBufferedWriter(file, StandardCharsets.UTF_8);
        out.write(header(names));
        out.write('\n');
    }

    static String header(List<String> names) {
        return "index," + String.join(",", names) + ",outcome,end_reason,exit_edge,end_time,exit_time,exit_x,exit_y,"
            + "exit_z,exit_vx,exit_vy,exit_vz,exit_speed,end_x,end_y,end_z,events,message";
    }

    /**
     * @param run a run
     * @return its CSV row (no newline)
     */
    static String row(SweepRun run) {
        StringBuilder b = new StringBuilder();
        b.append(run.index());
        for (int i = 0; i < run.point().size(); i++) {
            b.append(',').append(Decimals.shortest(run.point().value(i)));
        }
        b.append(',').append(Outcome.of(run));
        if (!run.isSuccess()) {
            b.append(",failed,,,,,,,,,,,,,,0,").append(quote(run.failure().orElse("")));
            return b.toString();
        }
        RunResult r = run.result().orElseThrow();
        b.append(',').append(SummaryJson.endReason(r.endReason()));
        RunEvent exit = r.exit().orElse(null);
        b.append(',').append(exit == null ? "" : exit.edge());
        b.append(',').append(r.endState().time());
        if (exit == null) {
            b.append(",,,,,,,,");
        } else {
            Vector3D p = exit.before().centre();
            Vector3D v = exit.before().velocity();
            b.append(',').append(exit.time());
            b.append(',').append(p.getX()).append(',').append(p.getY()).append(',').append(p.getZ());
            b.append(',').append(v.getX()).append(',').append(v.getY()).append(',').append(v.getZ());
            b.append(',').append(v.getNorm());
        }
        Vector3D e = r.endState().centre();
        b.append(',').append(e.getX()).append(',').append(e.getY()).append(',').append(e.getZ());
        b.append(',').append(r.events().size());
        b.append(',').append(quote(r.message()));
        return b.toString();
    }

    static String quote(String s) {
        if (s.isEmpty()) {
            return "";
        }
        return "\"" + s.replace("\"", "\"\"") + "\"";
    }

    @Override
    public void accept(SweepRun run) {
        try {
            out.write(row(run));
            out.write('\n');
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write " + file, e);
        }
    }

    @Override
    public void close() throws IOException {
        out.close();
    }
}
