package org.tjmargin.design;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import com.fasterxml.jackson.dataformat.yaml.YAMLParser;
import java.io.IOException;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

/**
 * Builds the located tree of one file with Jackson's streaming parser, which gives every token's line and column
 * ({@link JsonParser#currentTokenLocation()}).
 *
 * <p>A key written twice in one object is reported and its second value skipped; a YAML alias is reported (the
 * format is read without anchors and aliases, so every value is written where it applies); a second YAML document
 * is reported. A syntax error ends the file's reading: the parser cannot go on past it. Stateless and thread-safe
 * (Jackson's factories are).
 */
final class TreeReader {

    private static final JsonFactory JSON = new JsonFactory();
    private static final YAMLFactory YAML = new YAMLFactory();

    private TreeReader() {
    }

    /**
     * Parses a file.
     *
     * @param src the file's bytes
     * @param ctx where to report
     * @return the root value, or empty when the file could not be parsed (the reason is reported)
     */
    static Optional<Node> read(SourceFile src, FileContext ctx) {
        Optional<SourceFile.Syntax> syntax = src.syntax();
        if (syntax.isEmpty()) {
            ctx.report(InputProblem.Kind.SYNTAX, 0, 0, "",
                    "unknown file type: the name must end in .yaml, .yml or .json");
            return Optional.empty();
        }
        JsonFactory factory = syntax.get() == SourceFile.Syntax.JSON ? JSON : YAML;
        try (JsonParser p = factory.createParser(src.bytes())) {
            JsonToken first = p.nextToken();
            if (first == null) {
                ctx.report(InputProblem.Kind.SYNTAX, 1, 1, "", "the file is empty");
                return Optional.empty();
            }
            Node root = value(p, ctx, "");
            JsonToken after = p.nextToken();
            if (after != null) {
                JsonLocation l = p.currentTokenLocation();
                ctx.report(InputProblem.Kind.SYNTAX, line(l), column(l), "",
                        "only one document per file is read; remove what follows the first");
            }
            return Optional.of(root);
        } catch (JsonProcessingException e) {
            JsonLocation l = e.getLocation();
            ctx.report(InputProblem.Kind.SYNTAX, l == null ? 0 : line(l), l == null ? 0 : column(l), "",
                    syntaxMessage(e.getOriginalMessage()));
            return Optional.empty();
        } catch (IOException e) {
            ctx.report(InputProblem.Kind.SYNTAX, 0, 0, "", "cannot parse the file: " + e.getMessage());
            return Optional.empty();
        }
    }

    /** The value starting at the parser's current token; leaves the parser on the value's last token. */
    private static Node value(JsonParser p, FileContext ctx, String path) throws IOException {
        JsonLocation l = p.currentTokenLocation();
        int line = line(l);
        int col = column(l);
        JsonToken t = p.currentToken();
        switch (t) {
            case START_OBJECT:
                return mapping(p, ctx, path, line, col);
            case START_ARRAY: {
                List<Node> items = new ArrayList<>();
                while (p.nextToken() != JsonToken.END_ARRAY) {
                    items.add(value(p, ctx, path + "[" + items.size() + "]"));
                }
                return new Node.Sequence(items, line, col);
            }
            case VALUE_STRING:
                if (p instanceof YAMLParser y && y.isCurrentAlias()) {
                    ctx.report(InputProblem.Kind.SYNTAX, line, col, path,
                            "YAML aliases (*" + p.getText() + ") are not read; write the value out");
                    return new Node.Scalar("", Node.Scalar.Type.EMPTY, line, col);
                }
                return new Node.Scalar(p.getText(), Node.Scalar.Type.TEXT, line, col);
            case VALUE_NUMBER_INT:
            case VALUE_NUMBER_FLOAT:
                return new Node.Scalar(p.getText(), Node.Scalar.Type.NUMBER, line, col);
            case VALUE_TRUE:
            case VALUE_FALSE:
                return new Node.Scalar(p.getText(), Node.Scalar.Type.BOOLEAN, line, col);
            case VALUE_NULL:
                return new Node.Scalar("", Node.Scalar.Type.EMPTY, line, col);
            default:
                // Embedded objects (YAML binary) and the like: not part of the format.
                ctx.report(InputProblem.Kind.WRONG_TYPE, line, col, path, "unexpected " + t + " value");
                return new Node.Scalar("", Node.Scalar.Type.EMPTY, line, col);
        }
    }

    private static Node mapping(JsonParser p, FileContext ctx, String path, int line, int col) throws IOException {
        List<Node.Entry> entries = new ArrayList<>();
        Set<String> seen = new HashSet<>();
        while (p.nextToken() == JsonToken.FIELD_NAME) {
            String key = p.currentName();
            JsonLocation kl = p.currentTokenLocation();
            String keyPath = path.isEmpty() ? key : path + "." + key;
            p.nextToken();
            if (!seen.add(key)) {
                ctx.report(InputProblem.Kind.DUPLICATE_KEY, line(kl), column(kl), keyPath,
                        "key '" + key + "' is written twice in this object; the first is kept");
                p.skipChildren();
                continue;
            }
            entries.add(new Node.Entry(key, line(kl), column(kl), value(p, ctx, keyPath)));
        }
        return new Node.Mapping(entries, line, col);
    }

    private static int line(JsonLocation l) {
        return Math.max(0, l.getLineNr());
    }

    private static int column(JsonLocation l) {
        return Math.max(0, l.getColumnNr());
    }

    /**
     * The message without SnakeYAML's quoted snippets: its unindented lines ("while parsing a flow mapping",
     * "expected ',' or '}', but got ':'") joined; the location is reported separately.
     */
    private static String syntaxMessage(String message) {
        if (message == null || message.isBlank()) {
            return "syntax error";
        }
        StringBuilder sb = new StringBuilder();
        for (String l : message.split("\\R")) {
            if (l.isBlank() || Character.isWhitespace(l.charAt(0))) {
                continue;
            }
            if (sb.length() > 0) {
                sb.append("; ");
            }
            sb.append(l.strip());
        }
        return sb.length() == 0 ? message.strip() : sb.toString();
    }
}
