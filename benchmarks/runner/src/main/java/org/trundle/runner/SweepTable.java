package org.trundle.runner;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.function.Consumer;

import org.trundle.scenario.SweepRow;

/**
 * Streams {@code sweep.csv}: the header, then one {@link SweepRow#csv() row} per run, in index
 * order (the columns are documented on {@link SweepRow}; numbers are exact, shortest round-trip
 * decimals).
 */
final class SweepTable implements Consumer<SweepRow>, AutoCloseable {
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
        return SweepRow.header(names);
    }

    @Override
    public void accept(SweepRow row) {
        try {
            out.write(row.csv());
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
