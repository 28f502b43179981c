package org.trundle.docs;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;

/**
 * The README's Maven coordinates and minimal consumer project stay true (issue 17, item 8): the pom
 * and the first Java class in the README are the files of the consumer project that profile
 * {@code kit-it} builds against the installed artifacts ({@code src/it/readme-consumer}), and every
 * library artifact of the build is named in the README with the build's version.
 */
class ReadmeConsumerTest {
    /** The repository root, seen from this module's folder (where the tests run). */
    static final Path ROOT = Path.of("..", "..");
    static final Path CONSUMER = Path.of("src", "it", "readme-consumer");

    static String readme() throws IOException {
        return Files.readString(ROOT.resolve("README.md"));
    }

    /** The build's version: the parent pom's own version. */
    static String version() throws IOException {
        Matcher m = Pattern.compile("<artifactId>trundle-parent</artifactId>\\s*<version>([^<]+)</version>")
            .matcher(Files.readString(ROOT.resolve("pom.xml")));
        assertTrue(m.find(), "the root pom names its version");
        return m.group(1);
    }

    /** The fenced block of a language that follows the first line containing {@code marker}. */
    static String blockAfter(String text, String marker, String lang) {
        int at = text.indexOf(marker);
        assertTrue(at >= 0, "README has: " + marker);
        int open = text.indexOf("```" + lang + "\n", at);
        int close = text.indexOf("```\n", open + 4 + lang.length());
        return text.substring(open + 4 + lang.length(), close);
    }

    @Test
    void theMinimalPomIsTheConsumerProjectsPom() throws IOException {
        String pom = Files.readString(CONSUMER.resolve("pom.xml")).replace("@project.version@", version());
        assertEquals(pom, blockAfter(readme(), "A\nminimal project", "xml"));
    }

    @Test
    void theFirstExampleIsTheConsumerProjectsClass() throws IOException {
        String java = Files.readString(CONSUMER.resolve("src/main/java/com/example/guide/ReturnTube.java"));
        assertEquals(java, blockAfter(readme(), "A first run", "java"));
    }

    @Test
    void everyLibraryArtifactIsNamedWithItsCoordinates() throws IOException {
        String text = readme();
        assertTrue(text.contains("group\n`org.trundle`, version `" + version() + "`"), "group and version");
        for (String module : List.of("core", "core/kit", "core/kit-junit", "surfaces", "contact-models",
            "benchmarks/scenario", "benchmarks/report", "benchmarks/runner")) {
            Matcher m = Pattern.compile("</parent>\\s*<artifactId>([^<]+)</artifactId>")
                .matcher(Files.readString(ROOT.resolve(module).resolve("pom.xml")));
            assertTrue(m.find(), module);
            assertTrue(text.contains("| `" + m.group(1) + "` |"), "README names " + m.group(1));
        }
    }
}
