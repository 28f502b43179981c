package org.trundle.scenario;

import java.io.IOException;
import java.util.List;
import java.util.Map;

/**
 * A way to run a {@link SweepJob} other than the runner's local threads, found with
 * {@link java.util.ServiceLoader} (a module that provides one lists its class in
 * {@code META-INF/services/org.trundle.scenario.SweepEngine}). The {@code trundle-spark} module
 * provides {@code spark}; the runner's {@code sweep --engine NAME} picks it by {@link #name()}.
 *
 * <p>An engine writes its outputs under the output location itself, so the driver never holds all
 * rows, and runs every point: a failed run is a row with its reason, never a failed job.
 */
public interface SweepEngine {
    /** @return the engine's name on the command line (lower case) */
    String name();

    /**
     * Runs every point of the job and writes the outputs.
     *
     * @param job the sweep
     * @param out output location (a folder path or a URI the engine understands); it must not exist
     *     yet or be an empty folder
     * @param options engine settings: where it runs and how the work is split
     * @return what was done
     * @throws IOException when the outputs cannot be written
     * @throws ScenarioException for unusable settings or output location (exit code 2)
     */
    Report run(SweepJob job, String out, Options options) throws IOException;

    /**
     * Where an engine runs and how it splits the work.
     *
     * @param master the cluster to run on (for Spark a master URL such as {@code local[2]} or
     *     {@code spark://host:7077}); null to take the one the launcher configured
     * @param partitions number of parts the points are split into; 0 for the engine's default
     * @param picture whether to draw the regime map's picture ({@code regime-map.png}); false for {@code --no-plot}
     */
    record Options(String master, int partitions, boolean picture) {
        /** Checks the count. */
        public Options {
            if (partitions < 0) {
                throw new ScenarioException("--partitions must be at least 1, got " + partitions);
            }
        }

        /**
         * Options that draw the picture.
         *
         * @param master the cluster to run on, or null
         * @param partitions number of parts, 0 for the default
         */
        public Options(String master, int partitions) {
            this(master, partitions, true);
        }
    }

    /**
     * What an engine did.
     *
     * @param runs rows written
     * @param outcomes number of rows by outcome, in outcome order
     * @param files the outputs written (paths or URIs)
     */
    record Report(long runs, Map<String, Long> outcomes, List<String> files) {
    }
}
