package org.trundle.bench;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.ZoneOffset;
import java.time.ZonedDateTime;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

/**
 * Writes {@code benchmarks/RESULTS.md} from the JMH JSON results ({@code -rf json}), the
 * work–precision table of {@link WorkPrecision} and the output of {@link LongRunMemoryCheck}:
 * a dated Markdown page labelled with the machine (processors, CPU model, JDK, load average).
 *
 * <p>Usage: {@code java -cp benchmarks/jmh/target/trundle-benchmarks.jar org.trundle.bench.ResultsReport jmh.json work-precision.md
 * memory.txt command [start-load] > RESULTS.md}.
 */
public final class ResultsReport {
    private ResultsReport() {
    }

    /**
     * @param args JMH JSON file, work–precision Markdown file, memory-check output file, the
     *     command line that produced them, and optionally the load average when the suite started
     * @throws IOException when a file cannot be read
     */
    public static void main(String[] args) throws IOException {
        if (args.length < 4) {
            throw new IllegalArgumentException("usage: ResultsReport jmh.json work-precision.md memory.txt command,"
                + " got " + args.length + " arguments");
        }
        JsonNode root = new ObjectMapper().readTree(Path.of(args[0]).toFile());
        PrintStream out = new PrintStream(System.out, true, StandardCharsets.UTF_8);
        out.println("# Trundle benchmark results");
        out.println();
        out.printf(Locale.ROOT, "Measured %s on %d processors (%s), JDK %s (%s), load average at report time %s.%n",
            ZonedDateTime.now(ZoneOffset.UTC).format(DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm 'UTC'")),
            Runtime.getRuntime().availableProcessors(), cpuModel(), System.getProperty("java.version"),
            System.getProperty("java.vm.name"), loadAverage());
        if (args.length > 4) {
            out.println("Load average when the suite started: " + args[4] + " (1 / 5 / 15 min).");
        }
        out.println("Absolute times are indicative only (the machine may be shared); the ratios are the claim.");
        out.println();
        out.println("Command: `" + args[3] + "`");
        out.println();

        Map<String, JsonNode> byKey = new LinkedHashMap<>();
        for (JsonNode b : root) {
            byKey.put(key(b), b);
        }
        JsonNode lib = byKey.get("FullRunBenchmark.library");
        JsonNode base = byKey.get("FullRunBenchmark.baseline");
        out.println("## Cost of generality (vertical tube, same run, same tolerance 1e-10, accuracy checked)");
        out.println();
        out.println("| figure | value |");
        out.println("|---|---|");
        if (lib != null && base != null) {
            double l = score(lib);
            double b = score(base);
            out.printf(Locale.ROOT, "| library run (default settings and detectors) | %.3f ms |%n", 1e3 / l);
            out.printf(Locale.ROOT, "| hand-derived baseline run | %.3f ms |%n", 1e3 / b);
            out.printf(Locale.ROOT, "| **library / baseline wall time** (target ≤ 1.3) | **%.2f** |%n", b / l);
            out.printf(Locale.ROOT, "| library right-hand-side evaluations per second | %.3g |%n",
                secondary(lib, "libraryEvaluations"));
            out.printf(Locale.ROOT, "| library simulated seconds per wall second | %.1f |%n",
                secondary(lib, "librarySimulatedSeconds"));
            out.printf(Locale.ROOT, "| baseline right-hand-side evaluations per second | %.3g |%n",
                secondary(base, "baselineEvaluations"));
        }
        JsonNode pad = byKey.get("FullRunBenchmark.baselineWith19Components");
        JsonNode det = byKey.get("FullRunBenchmark.baselineWithOneDetector");
        if (base != null && pad != null && det != null) {
            double b = score(base);
            out.printf(Locale.ROOT, "| decomposition: baseline with a 19-component state (the library's full layout) / baseline | %.2f |%n",
                b / score(pad));
            out.printf(Locale.ROOT, "| decomposition: baseline with one event detector at a fixed 1 ms check interval / baseline"
                + " | %.2f |%n", b / score(det));
        }
        JsonNode kLib = byKey.get("KernelBenchmark.libraryKernel law=PURE_ROLLING");
        JsonNode kHand = byKey.get("KernelBenchmark.handDerivedKernel");
        if (kLib != null && kHand != null) {
            out.printf(Locale.ROOT, "| library kernel / hand-derived kernel, one evaluation | %.2f |%n",
                score(kLib) / score(kHand));
        }
        out.println();
        out.println("## All JMH results");
        out.println();
        out.println("| benchmark | parameters | mode | score | error (99.9%) | units | allocation (B/op) |");
        out.println("|---|---|---|---|---|---|---|");
        for (JsonNode b : root) {
            JsonNode pm = b.get("primaryMetric");
            JsonNode alloc = b.path("secondaryMetrics").path("gc.alloc.rate.norm");
            String name = b.get("benchmark").asText().replace("org.trundle.bench.", "");
            out.printf(Locale.ROOT, "| %s | %s | %s | %.4g | %.2g | %s | %s |%n", name, params(b),
                b.get("mode").asText(), pm.get("score").asDouble(), err(pm), pm.get("scoreUnit").asText(),
                alloc.isMissingNode() ? "n/a" : String.format(Locale.ROOT, "%.3g", alloc.get("score").asDouble()));
        }
        out.println();
        out.println("## Work–precision, vertical-tube height frequency (" + WorkPrecision.PERIODS + " periods)");
        out.println();
        out.print(Files.readString(Path.of(args[1]), StandardCharsets.UTF_8));
        out.println();
        out.println("## Long run with streamed output under -Xmx64m");
        out.println();
        out.println("```");
        out.print(Files.readString(Path.of(args[2]), StandardCharsets.UTF_8));
        out.println("```");
    }

    private static String key(JsonNode b) {
        String name = b.get("benchmark").asText().replace("org.trundle.bench.", "");
        String p = params(b);
        return p.isEmpty() ? name : name + " " + p;
    }

    private static String params(JsonNode b) {
        JsonNode p = b.get("params");
        if (p == null) {
            return "";
        }
        List<String> parts = new ArrayList<>();
        Iterator<Map.Entry<String, JsonNode>> it = p.fields();
        while (it.hasNext()) {
            Map.Entry<String, JsonNode> e = it.next();
            parts.add(e.getKey() + "=" + e.getValue().asText());
        }
        return String.join(",", parts);
    }

    private static double score(JsonNode b) {
        return b.get("primaryMetric").get("score").asDouble();
    }

    private static double err(JsonNode metric) {
        double e = metric.path("scoreError").asDouble(Double.NaN);
        return Double.isFinite(e) ? e : 0.0;
    }

    private static double secondary(JsonNode b, String name) {
        JsonNode m = b.path("secondaryMetrics").path(name);
        return m.isMissingNode() ? Double.NaN : m.get("score").asDouble();
    }

    private static String cpuModel() {
        try {
            for (String line : Files.readAllLines(Path.of("/proc/cpuinfo"), StandardCharsets.UTF_8)) {
                if (line.startsWith("model name")) {
                    return line.substring(line.indexOf(':') + 1).trim();
                }
            }
        } catch (IOException | RuntimeException e) {
            return System.getProperty("os.arch");
        }
        return System.getProperty("os.arch");
    }

    private static String loadAverage() {
        try {
            String[] f = Files.readString(Path.of("/proc/loadavg"), StandardCharsets.UTF_8).trim().split("\\s+");
            return f[0] + " / " + f[1] + " / " + f[2] + " (1 / 5 / 15 min)";
        } catch (IOException | RuntimeException e) {
            return "unknown";
        }
    }
}
