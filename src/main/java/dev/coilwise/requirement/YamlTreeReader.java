package dev.coilwise.requirement;

import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import com.fasterxml.jackson.dataformat.yaml.YAMLParser;
import dev.coilwise.error.Message;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.yaml.snakeyaml.LoaderOptions;
import org.yaml.snakeyaml.error.MarkedYAMLException;

/**
 * Reads YAML text safely into a {@link YamlNode} tree with positions.
 *
 * <p>Safety: text over {@link #MAX_BYTES} is refused before parsing; the parser is Jackson's streaming YAML parser,
 * which never builds objects from type tags and never expands aliases; coilwise also refuses every tag and alias
 * outright (a requirement file has no need for them, and an unexpanded alias would silently read as the anchor's
 * name). The SnakeYAML loader limits are set as well (aliases for collections, nesting depth, code points), so a
 * "billion laughs" file fails fast whichever layer sees it first.
 */
final class YamlTreeReader {
    /** Largest file read, bytes: 1 MiB. A requirement file is a few kB. */
    static final int MAX_BYTES = 1 << 20;
    /** SnakeYAML limit on aliases that point to collections. */
    static final int MAX_ALIASES_FOR_COLLECTIONS = 50;
    /** Deepest nesting of mappings and lists accepted; requirement files use three levels. */
    static final int MAX_DEPTH = 20;
    private static final String YAML_TAG_PREFIX = "tag:yaml.org,2002:";
    private static final YAMLFactory FACTORY = factory();

    private final Problems problems;
    private boolean refused;
    private int aliases;
    private YamlNode.Position firstAlias;
    private String firstAliasName;

    private YamlTreeReader(Problems problems) {
        this.problems = problems;
    }

    private static YAMLFactory factory() {
        LoaderOptions options = new LoaderOptions();
        options.setMaxAliasesForCollections(MAX_ALIASES_FOR_COLLECTIONS);
        options.setAllowRecursiveKeys(false);
        options.setNestingDepthLimit(MAX_DEPTH);
        options.setCodePointLimit(MAX_BYTES);
        options.setAllowDuplicateKeys(true); // reported by this reader, with both lines, instead of a bare parse error
        return YAMLFactory.builder().loaderOptions(options).build();
    }

    /**
     * Reads the text; returns the top-level mapping, or empty when the file cannot be read further (the reasons are
     * in {@code problems}). {@code needed} names the keys the file must have, for the empty-file message.
     */
    static Optional<YamlNode.Mapping> read(String text, Problems problems, String needed) {
        int bytes = text.getBytes(StandardCharsets.UTF_8).length;
        if (bytes > MAX_BYTES) {
            problems.add(YamlNode.Position.FILE, "", Message.FILE_TOO_LARGE.format("has " + bytes, MAX_BYTES, MAX_BYTES >> 20));
            return Optional.empty();
        }
        return new YamlTreeReader(problems).readTree(FileText.stripBom(text), needed);
    }

    private Optional<YamlNode.Mapping> readTree(String text, String needed) {
        try (YAMLParser p = (YAMLParser) FACTORY.createParser(text)) {
            JsonToken first = p.nextToken();
            if (first == null || first == JsonToken.VALUE_NULL
                    || first == JsonToken.VALUE_STRING && p.getText().isBlank()) {
                problems.add(new YamlNode.Position(1, 1), "", Message.YAML_EMPTY.format(needed));
                return Optional.empty();
            }
            YamlNode root = node(p, 0, "");
            reportAliases();
            if (p.nextToken() != null) {
                problems.add(position(p.currentTokenLocation()), "", Message.YAML_MORE_DOCUMENTS.format());
                return Optional.empty();
            }
            if (!(root instanceof YamlNode.Mapping map)) {
                problems.add(root.position(), "", Message.EXPECTED.format("keys such as " + needed, root.describe()));
                return Optional.empty();
            }
            return refused ? Optional.empty() : Optional.of(map);
        } catch (JsonProcessingException e) {
            reportAliases();
            syntax(e);
        } catch (TooDeep e) {
            problems.add(e.at, "", Message.YAML_TOO_DEEP.format(MAX_DEPTH));
        } catch (TooManyAliases e) {
            reportAliases();
        } catch (IOException | RuntimeException e) {
            problems.add(YamlNode.Position.FILE, "", Message.YAML_SYNTAX.format(brief(String.valueOf(e.getMessage()))));
        }
        return Optional.empty();
    }

    /** A syntax error, placed at SnakeYAML's problem mark when there is one (it points at the offending token). */
    private void syntax(JsonProcessingException e) {
        if (e.getCause() instanceof MarkedYAMLException m && m.getProblemMark() != null) {
            String what = (m.getContext() == null ? "" : m.getContext() + ": ") + m.getProblem();
            problems.add(new YamlNode.Position(m.getProblemMark().getLine() + 1, m.getProblemMark().getColumn() + 1), "",
                    Message.YAML_SYNTAX.format(brief(what)));
            return;
        }
        JsonLocation at = e.getLocation();
        problems.add(at == null ? YamlNode.Position.FILE : position(at), "", Message.YAML_SYNTAX.format(brief(e.getOriginalMessage())));
    }

    /** One problem for all aliases, at the first: a file with one has usually many, and listing each adds nothing. */
    private void reportAliases() {
        if (aliases == 1) {
            problems.add(firstAlias, "", Message.YAML_ALIAS.format(firstAliasName));
        } else if (aliases > 1) {
            problems.add(firstAlias, "", Message.YAML_ALIAS.format(firstAliasName + " and " + (aliases - 1) + " more"));
        }
        aliases = 0;
    }

    private YamlNode node(YAMLParser p, int depth, String path) throws IOException {
        YamlNode.Position at = position(p.currentTokenLocation());
        if (depth > MAX_DEPTH) {
            throw new TooDeep(at);
        }
        checkTagAndAlias(p, at);
        JsonToken t = p.currentToken();
        if (t == JsonToken.START_OBJECT) {
            Map<String, YamlNode.Entry> entries = new LinkedHashMap<>();
            while (p.nextToken() == JsonToken.FIELD_NAME) {
                String key = p.currentName();
                YamlNode.Position keyAt = position(p.currentTokenLocation());
                p.nextToken();
                String keyPath = path.isEmpty() ? key : path + "." + key;
                YamlNode value = node(p, depth + 1, keyPath);
                YamlNode.Entry earlier = entries.get(key);
                if (earlier != null) {
                    problems.add(keyAt, keyPath, Message.DUPLICATE_KEY.format(earlier.keyPosition().line()));
                } else {
                    entries.put(key, new YamlNode.Entry(keyAt, value));
                }
            }
            return new YamlNode.Mapping(entries, at);
        }
        if (t == JsonToken.START_ARRAY) {
            List<YamlNode> items = new ArrayList<>();
            while (p.nextToken() != JsonToken.END_ARRAY) {
                items.add(node(p, depth + 1, path));
            }
            return new YamlNode.Sequence(items, at);
        }
        Boolean bool = t == JsonToken.VALUE_TRUE ? Boolean.TRUE : t == JsonToken.VALUE_FALSE ? Boolean.FALSE : null;
        String text = t == JsonToken.VALUE_NULL ? "" : p.getText();
        YamlNode.Type type = bool != null ? YamlNode.Type.BOOLEAN : t == JsonToken.VALUE_NULL ? YamlNode.Type.NULL
                : t == JsonToken.VALUE_NUMBER_INT || t == JsonToken.VALUE_NUMBER_FLOAT ? YamlNode.Type.NUMBER
                : YamlNode.Type.STRING;
        return new YamlNode.Scalar(text == null ? "" : text, bool, type, at);
    }

    private void checkTagAndAlias(YAMLParser p, YamlNode.Position at) throws IOException {
        if (p.isCurrentAlias()) {
            if (aliases++ == 0) {
                firstAlias = at;
                firstAliasName = Shown.value(p.getText());
            }
            refused = true;
            if (aliases > MAX_ALIASES_FOR_COLLECTIONS) {
                throw new TooManyAliases(); // stop reading a file built to expand
            }
        }
        String tag = p.getTypeId();
        if (tag != null) {
            String shown = tag.startsWith(YAML_TAG_PREFIX) ? "!!" + tag.substring(YAML_TAG_PREFIX.length()) : tag;
            problems.add(at, "", Message.YAML_TAG.format(Shown.value(shown)));
            refused = true;
        }
    }

    private static YamlNode.Position position(JsonLocation loc) {
        return new YamlNode.Position(Math.max(loc.getLineNr(), 0), Math.max(loc.getColumnNr(), 0));
    }

    /** The first line of a parser message (SnakeYAML appends a snippet of the file, which the position replaces). */
    private static String brief(String message) {
        String m = message == null ? "" : message.strip();
        int nl = m.indexOf('\n');
        return nl < 0 ? m : m.substring(0, nl).strip();
    }

    /** Unwinds the recursion when a file holds more aliases than the limit. */
    private static final class TooManyAliases extends RuntimeException {
        private static final long serialVersionUID = 1L;

        TooManyAliases() {
            super(null, null, false, false);
        }
    }

    /** Unwinds the recursion when the nesting limit is passed. */
    private static final class TooDeep extends RuntimeException {
        private static final long serialVersionUID = 1L;
        private final transient YamlNode.Position at;

        TooDeep(YamlNode.Position at) {
            super(null, null, false, false);
            this.at = at;
        }
    }
}
