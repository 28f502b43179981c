package org.trundle.runner;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import org.trundle.scenario.ScenarioException;

/**
 * Checks and prepares the {@code --out} folder. {@code run} and {@code sweep} refuse a non-empty
 * folder unless forced; {@code demo} may replace a folder that an earlier demo wrote (it leaves a
 * marker file there) and refuses any other non-empty folder unless forced. Checking writes
 * nothing; {@link #create} makes the folder when the outputs are about to be written.
 */
final class OutputFolder {
    /** Marker file a demo leaves in its folder. */
    static final String DEMO_MARKER = ".trundle-demo";
    /** Files the runner writes (the demo replaces these). */
    static final List<String> OWN_FILES = List.of("summary.json", "trajectory.csv", "run.png", "scenario.json",
        "sweep.csv", "regime-map.png", DEMO_MARKER);

    private OutputFolder() {
    }

    /**
     * @param dir the folder
     * @param force whether a non-empty folder is acceptable
     */
    static void check(Path dir, boolean force) {
        if (Files.exists(dir) && !Files.isDirectory(dir)) {
            throw new ScenarioException("--out " + dir + " exists and is not a folder");
        }
        if (!force && !isEmpty(dir)) {
            throw new ScenarioException("--out folder " + dir + " is not empty; choose another folder or add --force to"
                + " write into it");
        }
    }

    /**
     * The demo's check: an earlier demo's folder may be replaced.
     *
     * @param dir the folder
     * @param force whether any non-empty folder is acceptable
     */
    static void checkDemo(Path dir, boolean force) {
        if (Files.exists(dir.resolve(DEMO_MARKER))) {
            return;
        }
        check(dir, force);
    }

    /**
     * Creates the folder; for the demo, removes the files an earlier demo wrote there.
     *
     * @param dir the folder
     * @param demo whether this is the demo's folder
     * @throws IOException when it cannot be created
     */
    static void create(Path dir, boolean demo) throws IOException {
        Files.createDirectories(dir);
        if (demo) {
            for (String f : OWN_FILES) {
                Files.deleteIfExists(dir.resolve(f));
            }
            Files.writeString(dir.resolve(DEMO_MARKER), "written by 'trundle demo'; the next demo run may replace the"
                + " runner's files in this folder\n");
        }
    }

    private static boolean isEmpty(Path dir) {
        if (!Files.isDirectory(dir)) {
            return true;
        }
        try (Stream<Path> s = Files.list(dir)) {
            return s.findAny().isEmpty();
        } catch (IOException e) {
            throw new ScenarioException("cannot read --out folder " + dir + ": " + e.getMessage());
        }
    }
}
