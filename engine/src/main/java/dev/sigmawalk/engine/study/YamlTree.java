package dev.sigmawalk.engine.study;

import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import dev.sigmawalk.engine.data.InputException;
import dev.sigmawalk.engine.data.InputFile;
import dev.sigmawalk.engine.data.TextEncoding;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.yaml.snakeyaml.error.MarkedYAMLException;

/**
 * Reads a YAML file into {@link YamlNode}s through Jackson's streaming parser, which reports the
 * position of every token (a data-binding tree would lose it). A key given twice in one mapping
 * is an error, since YAML leaves its meaning to the reader.
 */
public final class YamlTree {
    private final Path file;
    private final JsonParser parser;

    private YamlTree(Path file, JsonParser parser) {
        this.file = file;
        this.parser = parser;
    }

    /**
     * @return the document's root node
     * @throws InputException when the file is missing, empty or not valid YAML
     */
    public static YamlNode parse(Path file) {
        TextEncoding.requireUtf8(file, "study file");
        return parse(file, factory -> factory.createParser(file.toFile()));
    }

    /**
     * Parses {@code text} as if it were the content of {@code file}: messages name {@code file}.
     *
     * @throws InputException when the text is empty or not valid YAML
     */
    public static YamlNode parse(Path file, String text) {
        return parse(file, factory -> factory.createParser(text));
    }

    /** Opens a parser over the document's source. */
    private interface Source {
        JsonParser open(YAMLFactory factory) throws IOException;
    }

    private static YamlNode parse(Path file, Source source) {
        try (JsonParser parser = source.open(new YAMLFactory())) {
            JsonToken first = parser.nextToken();
            if (first == null) {
                throw new InputException(new InputException.Location(file, 0, null),
                        "the study file is empty; expected keys such as title, data, walkforward, strategies");
            }
            YamlNode root = new YamlTree(file, parser).node(first);
            // A YAML stream may hold several documents; a reader that took the first alone would
            // run a study other than the one the user last edited below the '---'. An empty one
            // (a closing '---' with nothing or only comments after it) holds nothing to lose.
            JsonToken next;
            while ((next = parser.nextToken()) == JsonToken.VALUE_NULL) {
                continue;
            }
            if (next != null) {
                JsonLocation at = parser.currentTokenLocation();
                throw InputException.at(file, at.getLineNr(), at.getColumnNr(), "a second YAML document starts"
                        + " here, after a '---' line; expected one document per file: remove it, or move it into a"
                        + " file of its own");
            }
            return root;
        } catch (JsonProcessingException e) {
            JsonLocation at = e.getLocation();
            int line = at == null ? 0 : at.getLineNr();
            int column = at == null ? 0 : at.getColumnNr();
            // The YAML scanner knows where the problem is; the parser's location can be the token before.
            if (e.getCause() instanceof MarkedYAMLException m && m.getProblemMark() != null) {
                line = m.getProblemMark().getLine() + 1;
                column = m.getProblemMark().getColumn() + 1;
            }
            throw InputException.at(file, line, column, "not valid YAML (" + oneLine(e.getOriginalMessage()) + ")");
        } catch (IOException e) {
            throw InputFile.unreadable(file, e);
        }
    }

    /**
     * The scanner's message without the excerpt it appends (" in 'reader', line ..., column ...:"
     * and the line with a caret), its remaining line breaks turned into "; ".
     */
    static String oneLine(String message) {
        String text = message == null ? "" : message;
        int excerpt = text.indexOf("\n in 'reader'");
        if (excerpt >= 0) {
            text = text.substring(0, excerpt);
        }
        return text.strip().replaceAll("\\s*\\R\\s*", "; ");
    }

    private YamlNode node(JsonToken token) throws IOException {
        JsonLocation at = parser.currentTokenLocation();
        int line = at.getLineNr();
        int column = at.getColumnNr();
        switch (token) {
            case START_OBJECT:
                return mapping(line, column);
            case START_ARRAY:
                return sequence(line, column);
            case VALUE_STRING:
                return new YamlNode.Scalar(wholeCharacters(parser.getText(), line, column), YamlNode.Scalar.Kind.STRING,
                        line, column);
            case VALUE_NUMBER_INT:
                return new YamlNode.Scalar(parser.getText(), YamlNode.Scalar.Kind.INTEGER, line, column);
            case VALUE_NUMBER_FLOAT:
                return new YamlNode.Scalar(parser.getText(), YamlNode.Scalar.Kind.DECIMAL, line, column);
            case VALUE_TRUE:
            case VALUE_FALSE:
                return new YamlNode.Scalar(parser.getText(), YamlNode.Scalar.Kind.BOOLEAN, line, column);
            case VALUE_NULL:
                return new YamlNode.Scalar(null, YamlNode.Scalar.Kind.NULL, line, column);
            default:
                throw InputException.at(file, line, column, "unexpected YAML content (" + token + ")");
        }
    }

    /**
     * {@code text} when every UTF-16 surrogate in it is half of a pair. A lone one (which a
     * double-quoted YAML string can spell as an escape such as {@code \uD800}) is no character:
     * no output file could hold it in UTF-8, so it is refused here, at its line and column,
     * rather than when the first file is written.
     */
    private String wholeCharacters(String text, int line, int column) {
        for (int k = 0; k < text.length(); k++) {
            char c = text.charAt(k);
            if (Character.isHighSurrogate(c) && k + 1 < text.length() && Character.isLowSurrogate(text.charAt(k + 1))) {
                k++;
            } else if (Character.isSurrogate(c)) {
                throw InputException.at(file, line, column, String.format(Locale.ROOT, "the text holds a lone UTF-16"
                        + " surrogate (U+%04X, character %d), which is half of a character and cannot be written to"
                        + " any output file; expected whole characters: write the character itself, or both halves"
                        + " of its escape pair", (int) c, k + 1));
            }
        }
        return text;
    }

    private YamlNode mapping(int line, int column) throws IOException {
        Map<String, YamlNode.Entry> entries = new LinkedHashMap<>();
        JsonToken token;
        while ((token = parser.nextToken()) == JsonToken.FIELD_NAME) {
            JsonLocation at = parser.currentTokenLocation();
            String key = wholeCharacters(parser.currentName(), at.getLineNr(), at.getColumnNr());
            YamlNode value = node(parser.nextToken());
            YamlNode.Entry earlier = entries.put(key, new YamlNode.Entry(key, at.getLineNr(), at.getColumnNr(), value));
            if (earlier != null) {
                throw InputException.at(file, at.getLineNr(), at.getColumnNr(),
                        "key '" + key + "' is given twice (first on line " + earlier.line() + "); give it once");
            }
        }
        requireEnd(token, JsonToken.END_OBJECT);
        return new YamlNode.Mapping(entries, line, column);
    }

    private YamlNode sequence(int line, int column) throws IOException {
        List<YamlNode> items = new ArrayList<>();
        JsonToken token;
        while ((token = parser.nextToken()) != JsonToken.END_ARRAY && token != null) {
            items.add(node(token));
        }
        requireEnd(token, JsonToken.END_ARRAY);
        return new YamlNode.Sequence(items, line, column);
    }

    private void requireEnd(JsonToken token, JsonToken expected) {
        if (token != expected) {
            JsonLocation at = parser.currentLocation();
            throw InputException.at(file, at.getLineNr(), at.getColumnNr(), "the YAML document ends unexpectedly");
        }
    }
}
