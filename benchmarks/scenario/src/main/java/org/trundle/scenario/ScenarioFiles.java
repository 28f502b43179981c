package org.trundle.scenario;

import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.Iterator;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.core.util.JsonParserDelegate;
import com.fasterxml.jackson.core.StreamReadConstraints;
import com.fasterxml.jackson.core.exc.StreamConstraintsException;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import com.fasterxml.jackson.dataformat.yaml.YAMLParser;

/**
 * Reading scenario documents (JSON, strict: no duplicate keys, nothing after the document; or YAML
 * with the same keys, for files named {@code *.yaml} or {@code *.yml}) and the shared JSON mapper for
 * outputs.
 */
public final class ScenarioFiles {
    /** Parser limits: nesting, key and string lengths a little above {@link Texts}' (checked after parsing). */
    private static final StreamReadConstraints LIMITS = StreamReadConstraints.builder()
        .maxNestingDepth(Texts.MAX_DEPTH + 1).maxNameLength(Texts.MAX_KEY_CHARS * 4)
        .maxStringLength(Texts.MAX_STRING_CHARS * 4).maxNumberLength(400).build();

    /** The mapper: strict reading, indented writing. */
    public static final ObjectMapper JSON = new ObjectMapper(JsonFactory.builder().streamReadConstraints(LIMITS).build())
        .enable(JsonParser.Feature.STRICT_DUPLICATE_DETECTION)
        .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS)
        .enable(SerializationFeature.INDENT_OUTPUT);

    /** The YAML reader: the same keys and checks as JSON. */
    static final ObjectMapper YAML = new ObjectMapper(YAMLFactory.builder().streamReadConstraints(LIMITS).build())
        .enable(JsonParser.Feature.STRICT_DUPLICATE_DETECTION)
        .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS);

    /** Resource path of the built-in demo scenario. */
    static final String DEMO_RESOURCE = "/org/trundle/scenario/demo-return-tube.json";

    private ScenarioFiles() {
    }

    /**
     * Reads a scenario file: at most {@link Texts#MAX_FILE_BYTES} bytes of UTF-8 text (a leading
     * byte-order mark is skipped, in JSON and YAML alike), parsed as YAML for {@code *.yaml} and
     * {@code *.yml} files, as JSON otherwise.
     *
     * @param file a scenario file
     * @return its JSON document
     * @throws ScenarioException when missing, too large, not UTF-8, or malformed (with line and column)
     */
    public static JsonNode read(Path file) {
        String name = file.getFileName() == null ? "" : file.getFileName().toString().toLowerCase(Locale.ROOT);
        boolean yaml = name.endsWith(".yaml") || name.endsWith(".yml");
        return parse(readText(file), yaml ? YAML : JSON, yaml ? "YAML" : "JSON");
    }

    /**
     * @param file a scenario file
     * @return its text, checked for size and encoding
     */
    static String readText(Path file) {
        String shown = Texts.clip(file.toString());
        if (Files.isDirectory(file)) {
            throw new ScenarioException("scenario file " + shown + " is a folder, not a file");
        }
        byte[] bytes;
        try (InputStream in = Files.newInputStream(file)) {
            bytes = in.readNBytes(Texts.MAX_FILE_BYTES + 1);
        } catch (NoSuchFileException e) {
            throw new ScenarioException("no such scenario file: " + shown);
        } catch (AccessDeniedException e) {
            throw new ScenarioException("cannot read scenario file " + shown + ": permission denied");
        } catch (IOException e) {
            throw new ScenarioException("cannot read scenario file " + shown + ": " + Texts.clip(e.getMessage()));
        }
        if (bytes.length > Texts.MAX_FILE_BYTES) {
            throw new ScenarioException("scenario file " + shown + " is larger than " + Texts.MAX_FILE_BYTES
                + " bytes (1 MiB), the most a scenario file may hold");
        }
        return decode(bytes, shown);
    }

    /**
     * @param bytes file content
     * @param shown the file's name for messages
     * @return the text (strict UTF-8)
     */
    static String decode(byte[] bytes, String shown) {
        CharsetDecoder d = StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
            .onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer in = ByteBuffer.wrap(bytes);
        CharBuffer out = CharBuffer.allocate(bytes.length);
        CoderResult r = d.decode(in, out, true);
        if (r.isUnderflow()) {
            r = d.flush(out);
        }
        if (r.isError()) {
            int at = in.position();
            int line = 1;
            for (int i = 0; i < at; i++) {
                if (bytes[i] == '\n') {
                    line++;
                }
            }
            throw new ScenarioException(String.format(Locale.ROOT, "scenario file %s is not UTF-8 text: byte 0x%02X at"
                + " offset %d (line %d) is not valid UTF-8; save the file as UTF-8", shown, bytes[at] & 0xff, at, line));
        }
        out.flip();
        return out.toString();
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
        if (text.length() > Texts.MAX_FILE_BYTES) {
            throw new ScenarioException("the scenario is longer than " + Texts.MAX_FILE_BYTES + " characters (1 MiB),"
                + " the most a scenario may hold");
        }
        String t = !text.isEmpty() && text.charAt(0) == '\uFEFF' ? text.substring(1) : text;
        try {
            JsonNode n = mapper == YAML ? readYaml(t) : mapper.readTree(t);
            if (n == null || n.isMissingNode()) {
                throw new ScenarioException("malformed " + format + ": the file is empty");
            }
            checkSizes(n, "", 0);
            return n;
        } catch (StreamConstraintsException e) {
            throw new ScenarioException("malformed " + format + ": " + constraint(e.getOriginalMessage()));
        } catch (JsonProcessingException e) {
            JsonLocation loc = e.getLocation();
            String where = loc == null || loc.getLineNr() < 1 ? "" : " at line " + loc.getLineNr() + ", column "
                + loc.getColumnNr();
            String m = e.getOriginalMessage();
            if (m != null && m.contains("AliasEvent")) {
                throw new ScenarioException("YAML alias" + where + ": scenario files take no anchors and aliases; write"
                    + " the value out in full");
            }
            throw new ScenarioException("malformed " + format + where + ": " + plain(m));
        } catch (IOException e) {
            throw new ScenarioException("malformed " + format + ": " + plain(e.getMessage()));
        }
    }

    /**
     * Reads one YAML document in one pass, refusing aliases ({@code *name}: Jackson would read them
     * as the anchor's name) and a second document.
     */
    private static JsonNode readYaml(String text) throws IOException {
        try (JsonParser p = YAML.getFactory().createParser(text)) {
            JsonParser checked = new JsonParserDelegate(p) {
                @Override
                public JsonToken nextToken() throws IOException {
                    JsonToken t = super.nextToken();
                    if (((YAMLParser) delegate).isCurrentAlias()) {
                        JsonLocation l = delegate.currentTokenLocation();
                        throw new ScenarioException("YAML alias *" + Texts.clip(delegate.getText()) + " at line "
                            + l.getLineNr() + ", column " + l.getColumnNr() + ": scenario files take no anchors and"
                            + " aliases; write the value out in full");
                    }
                    return t;
                }

                @Override
                public String nextFieldName() throws IOException {
                    return nextToken() == JsonToken.FIELD_NAME ? currentName() : null;
                }
            };
            JsonNode n = YAML.readTree(checked);
            if (n != null && checked.nextToken() != null) {
                JsonLocation l = p.currentTokenLocation();
                throw new ScenarioException("malformed YAML at line " + l.getLineNr() + ", column " + l.getColumnNr()
                    + ": more after the end of the document (a scenario file holds one)");
            }
            return n;
        }
    }

    /** Keys, strings and nesting within the documented limits ({@link Texts}). */
    private static void checkSizes(JsonNode n, String path, int depth) {
        if (depth > Texts.MAX_DEPTH) {
            throw new ScenarioException("the scenario nests objects and lists deeper than " + Texts.MAX_DEPTH
                + " levels (at " + Texts.clip(path) + ")");
        }
        if (n.isTextual() && n.textValue().length() > Texts.MAX_STRING_CHARS) {
            throw new ScenarioException((path.isEmpty() ? "the document" : Texts.clip(path)) + " is a string of "
                + n.textValue().length() + " characters; strings may have at most " + Texts.MAX_STRING_CHARS);
        }
        if (n.isObject()) {
            Iterator<Map.Entry<String, JsonNode>> it = n.fields();
            while (it.hasNext()) {
                Map.Entry<String, JsonNode> e = it.next();
                String p = path.isEmpty() ? e.getKey() : path + "." + e.getKey();
                if (e.getKey().length() > Texts.MAX_KEY_CHARS) {
                    throw new ScenarioException("key " + Texts.clip(p) + " has " + e.getKey().length()
                        + " characters; keys may have at most " + Texts.MAX_KEY_CHARS);
                }
                checkSizes(e.getValue(), p, depth + 1);
            }
        } else if (n.isArray()) {
            for (int i = 0; i < n.size(); i++) {
                checkSizes(n.get(i), path + "[" + i + "]", depth + 1);
            }
        }
    }

    /** A parser message without the parser's own option names, with long tokens cut. */
    static String plain(String message) {
        String m = message == null ? "" : message;
        int cut = m.indexOf('\n');
        if (cut >= 0) {
            m = m.substring(0, cut);
        }
        m = m.replaceAll("\\[Source: .*?; line: ", "[line: ");
        m = m.replaceAll("Trailing token .*", "more after the end of the document (a scenario file holds one)");
        m = m.replaceAll("<org\\.yaml\\.snakeyaml\\.events\\.(\\w+)Event\\(.*?\\)>", "a YAML $1");
        m = m.replaceAll(": enable `[^`]*` to allow", " (scenario numbers must be finite)");
        m = m.replaceAll("\\s*\\(not recognized as one since Feature '[A-Z_]+' not enabled for parser\\)",
            " (comments are not allowed in JSON)");
        m = m.replaceAll(",? from `[^`]*`", "");
        m = m.replaceAll("`?[A-Za-z]*(Feature|Constraints)\\.[A-Za-z_.()]*`?", "an option");
        Matcher q = QUOTED.matcher(m);
        StringBuilder b = new StringBuilder();
        while (q.find()) {
            q.appendReplacement(b, Matcher.quoteReplacement("'" + Texts.clip(q.group(1)) + "'"));
        }
        q.appendTail(b);
        return b.toString().trim();
    }

    private static final Pattern QUOTED = Pattern.compile("'([^'\\s]{" + (Texts.ECHO_CHARS + 1) + ",})'");

    /** A parser limit's message in our words. */
    private static String constraint(String message) {
        String m = message == null ? "" : message;
        if (m.contains("nesting depth")) {
            return "objects and lists nested deeper than " + Texts.MAX_DEPTH + " levels";
        }
        if (m.contains("Name length")) {
            return "a key longer than " + Texts.MAX_KEY_CHARS + " characters";
        }
        if (m.contains("String value length")) {
            return "a string longer than " + Texts.MAX_STRING_CHARS + " characters";
        }
        if (m.contains("Number value length")) {
            return "a number written with too many digits";
        }
        return plain(m);
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
