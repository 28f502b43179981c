package org.trundle.runner;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import org.trundle.scenario.ScenarioException;
import org.trundle.scenario.Texts;

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
        String shown = Texts.clip(dir.toString());
        if (Files.isSymbolicLink(dir) && !Files.exists(dir)) {
            throw new ScenarioException("--out " + shown + " is a symbolic link to " + Texts.clip(target(dir))
                + ", which does not exist; create the folder it points to or choose another --out");
        }
        if (Files.exists(dir) && !Files.isDirectory(dir)) {
            throw new ScenarioException("--out " + shown + " exists and is not a folder");
        }
        Path existing = dir.toAbsolutePath();
        while (existing != null && !Files.exists(existing)) {
            existing = existing.getParent();
        }
        if (existing != null && !Files.isDirectory(existing)) {
            throw new ScenarioException("--out " + shown + " cannot be created: " + Texts.clip(existing.toString())
                + " is a file, not a folder");
        }
        if (existing != null && !Files.isWritable(existing)) {
            throw new ScenarioException("--out " + shown + " cannot be written: permission denied on "
                + Texts.clip(existing.toString()) + "; choose a folder you may write");
        }
        if (!force && !isEmpty(dir)) {
            throw new ScenarioException("--out folder " + Texts.clip(dir.toString()) + " is not empty; choose another folder or add --force to"
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

    private static String target(Path link) {
        try {
            return Files.readSymbolicLink(link).toString();
        } catch (IOException e) {
            return "a missing target";
        }
    }

    private static boolean isEmpty(Path dir) {
        if (!Files.isDirectory(dir)) {
            return true;
        }
        try (Stream<Path> s = Files.list(dir)) {
            return s.findAny().isEmpty();
        } catch (IOException e) {
            throw new ScenarioException("cannot read --out folder " + Texts.clip(dir.toString()) + ": "
                + Main.describe(e));
        }
    }
}
