package org.trundle.scenario;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;

import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;

/**
 * Reading scenario documents (JSON, strict: no duplicate keys, nothing after the document; or YAML
 * with the same keys, for files named {@code *.yaml} or {@code *.yml}) and the shared JSON mapper for
 * outputs.
 */
public final class ScenarioFiles {
    /** The mapper: strict reading, indented writing. */
    public static final ObjectMapper JSON = new ObjectMapper()
        .enable(JsonParser.Feature.STRICT_DUPLICATE_DETECTION)
        .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS)
        .enable(SerializationFeature.INDENT_OUTPUT);

    /** The YAML reader: the same keys and checks as JSON. */
    static final ObjectMapper YAML = new ObjectMapper(new YAMLFactory())
        .enable(JsonParser.Feature.STRICT_DUPLICATE_DETECTION)
        .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS);

    /** Resource path of the built-in demo scenario. */
    static final String DEMO_RESOURCE = "/org/trundle/scenario/demo-return-tube.json";

    private ScenarioFiles() {
    }

    /**
     * @param file a scenario file
     * @return its JSON document
     * @throws ScenarioException when unreadable or malformed (with line and column)
     */
    public static JsonNode read(Path file) {
        String text;
        try {
            text = Files.readString(file, StandardCharsets.UTF_8);
        } catch (NoSuchFileException e) {
            throw new ScenarioException("no such scenario file: " + file);
        } catch (IOException e) {
            throw new ScenarioException("cannot read scenario file " + file + ": " + e.getMessage());
        }
        String name = file.getFileName() == null ? "" : file.getFileName().toString().toLowerCase(java.util.Locale.ROOT);
        return name.endsWith(".yaml") || name.endsWith(".yml") ? parse(text, YAML, "YAML") : parse(text);
    }

    /**
     * @param text JSON text
     * @return the document
     */
    public static JsonNode parse(String text) {
        return parse(text, JSON, "JSON");
    }

    /**
     * @param text document text
     * @param mapper the reader for its format
     * @param format the format's name for messages
     * @return the document
     */
    static JsonNode parse(String text, ObjectMapper mapper, String format) {
        try {
            JsonNode n = mapper.readTree(text);
            if (n == null || n.isMissingNode()) {
                throw new ScenarioException("malformed " + format + ": the file is empty");
            }
            return n;
        } catch (JsonProcessingException e) {
            JsonLocation loc = e.getLocation();
            String m = e.getOriginalMessage();
            int cut = m.indexOf('\n');
            if (cut >= 0) {
                m = m.substring(0, cut);
            }
            m = m.replaceAll("\\[Source: .*?; line: ", "[line: ");
            String where = loc == null ? "" : " at line " + loc.getLineNr() + ", column " + loc.getColumnNr();
            throw new ScenarioException("malformed " + format + where + ": " + m.trim());
        }
    }

    /** @return the text of the embedded demo scenario */
    public static String demoText() {
        try (InputStream in = ScenarioFiles.class.getResourceAsStream(DEMO_RESOURCE)) {
            if (in == null) {
                throw new IllegalStateException("demo scenario resource missing: " + DEMO_RESOURCE);
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new IllegalStateException("cannot read the demo scenario resource", e);
        }
    }
}
