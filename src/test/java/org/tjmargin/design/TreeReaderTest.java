package org.tjmargin.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/** The located tree: where keys and values start, in YAML and JSON, and what the reader refuses. */
class TreeReaderTest {

    private static Node parse(String name, String text, Problems problems) {
        byte[] b = text.getBytes(StandardCharsets.UTF_8);
        SourceFile src = new SourceFile(Path.of(name), name, b, SourceFile.sha256Of(b));
        return TreeReader.read(src, new FileContext(name, problems)).orElseThrow(() -> {
            problems.throwIfAny();
            return new AssertionError("no tree and no problem");
        });
    }

    @Test
    void yamlKeysAndValuesCarryTheirLineAndColumn() {
        Node root = parse("a.yaml", "top:\n  list:\n    - {k: 12 V}\n    - plain\n", new Problems());
        Node.Mapping top = assertInstanceOf(Node.Mapping.class, root);
        Node.Entry e = top.entry("top").orElseThrow();
        assertEquals(List.of(1, 1), List.of(e.line(), e.column()));
        Node.Mapping inner = assertInstanceOf(Node.Mapping.class, e.value());
        Node.Entry list = inner.entry("list").orElseThrow();
        assertEquals(List.of(2, 3), List.of(list.line(), list.column()));
        Node.Sequence seq = assertInstanceOf(Node.Sequence.class, list.value());
        Node.Mapping first = assertInstanceOf(Node.Mapping.class, seq.items().get(0));
        Node.Entry k = first.entry("k").orElseThrow();
        assertEquals(List.of(3, 8), List.of(k.line(), k.column()));
        Node.Scalar v = assertInstanceOf(Node.Scalar.class, k.value());
        assertEquals("12 V", v.text());
        assertEquals(List.of(3, 11), List.of(v.line(), v.column()));
        Node.Scalar plain = assertInstanceOf(Node.Scalar.class, seq.items().get(1));
        assertEquals(List.of(4, 7), List.of(plain.line(), plain.column()));
    }

    @Test
    void jsonValuesCarryTheirLineAndColumn() {
        Node root = parse("a.json", "{\n  \"a\": [1, \"2 V\"],\n  \"b\": true\n}", new Problems());
        Node.Mapping top = assertInstanceOf(Node.Mapping.class, root);
        Node.Sequence a = assertInstanceOf(Node.Sequence.class, top.entry("a").orElseThrow().value());
        Node.Scalar one = assertInstanceOf(Node.Scalar.class, a.items().get(0));
        assertEquals(Node.Scalar.Type.NUMBER, one.type());
        assertEquals(List.of(2, 9), List.of(one.line(), one.column()));
        Node.Scalar two = assertInstanceOf(Node.Scalar.class, a.items().get(1));
        assertEquals(List.of(2, 12), List.of(two.line(), two.column()));
        Node.Entry b = top.entry("b").orElseThrow();
        assertEquals(List.of(3, 3), List.of(b.line(), b.column()));
        assertEquals(Node.Scalar.Type.BOOLEAN, ((Node.Scalar) b.value()).type());
    }

    @Test
    void yamlKeepsNumbersAsWritten() {
        Node.Mapping m = (Node.Mapping) parse("a.yaml", "a: 0.050\nb: 76\nc: ~\n", new Problems());
        assertEquals("0.050", ((Node.Scalar) m.entry("a").orElseThrow().value()).text());
        assertEquals(Node.Scalar.Type.NUMBER, ((Node.Scalar) m.entry("b").orElseThrow().value()).type());
        assertEquals(Node.Scalar.Type.EMPTY, ((Node.Scalar) m.entry("c").orElseThrow().value()).type());
    }

    @Test
    void aDuplicateKeyIsReportedAndTheFirstKept() {
        Problems problems = new Problems();
        Node.Mapping m = (Node.Mapping) parse("a.json", "{\"a\": 1,\n \"a\": {\"deep\": [2]}, \"b\": 3}", problems);
        assertEquals("1", ((Node.Scalar) m.entry("a").orElseThrow().value()).text());
        assertTrue(m.entry("b").isPresent());
        InputProblem p = assertThrows(InputException.class, problems::throwIfAny).problems().get(0);
        assertEquals(InputProblem.Kind.DUPLICATE_KEY, p.kind());
        assertEquals(List.of(2, 2), List.of(p.line(), p.column()));
        assertEquals("a", p.field());
    }

    @Test
    void aliasesAndSecondDocumentsAreRefused() {
        Problems problems = new Problems();
        parse("a.yaml", "a: &x 1\nb: *x\n---\nc: 2\n", problems);
        List<InputProblem> ps = assertThrows(InputException.class, problems::throwIfAny).problems();
        assertEquals(List.of(InputProblem.Kind.SYNTAX, InputProblem.Kind.SYNTAX),
                ps.stream().map(InputProblem::kind).toList());
        assertEquals("b", ps.get(0).field());
        assertEquals(2, ps.get(0).line());
        assertEquals(4, ps.get(1).line());
    }

    @Test
    void anEmptyFileIsASyntaxProblem() {
        Problems problems = new Problems();
        byte[] b = new byte[0];
        SourceFile src = new SourceFile(Path.of("e.yaml"), "e.yaml", b, SourceFile.sha256Of(b));
        assertEquals(Optional.empty(), TreeReader.read(src, new FileContext("e.yaml", problems)));
        InputProblem p = assertThrows(InputException.class, problems::throwIfAny).problems().get(0);
        assertEquals(InputProblem.Kind.SYNTAX, p.kind());
    }

    @Test
    void formatOmitsWhatIsUnknown() {
        assertEquals("f.yaml:3:7: a.b: bad",
                new InputProblem(InputProblem.Kind.NOT_PHYSICAL, "f.yaml", 3, 7, "a.b", "bad").format());
        assertEquals("f.yaml: gone", new InputProblem(InputProblem.Kind.FILE_NOT_FOUND, "f.yaml", 0, 0, "", "gone")
                .format());
    }
}
