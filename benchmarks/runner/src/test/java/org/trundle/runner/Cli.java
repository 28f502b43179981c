package org.trundle.runner;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.trundle.scenario.ScenarioFiles;

/** Runs the command line in-process with captured output (test helper). */
final class Cli {
    /** What a command printed and returned. */
    record Result(int code, String out, String err) {
    }

    private Cli() {
    }

    static Result run(String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code = Main.execute(new PrintStream(out, true, StandardCharsets.UTF_8),
            new PrintStream(err, true, StandardCharsets.UTF_8), args);
        return new Result(code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    static Path write(Path dir, String name, String json) {
        try {
            Path p = dir.resolve(name);
            Files.writeString(p, json, StandardCharsets.UTF_8);
            return p;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The demo's scenario with some text replaced (each replacement must match). */
    static String demoWith(String... fromTo) {
        String s = ScenarioFiles.demoText();
        for (int i = 0; i < fromTo.length; i += 2) {
            if (!s.contains(fromTo[i])) {
                throw new IllegalArgumentException("demo scenario has no " + fromTo[i]);
            }
            s = s.replace(fromTo[i], fromTo[i + 1]);
        }
        return s;
    }
}
