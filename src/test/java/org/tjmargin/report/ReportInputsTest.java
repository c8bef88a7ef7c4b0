package org.tjmargin.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;

/** Input digests and the report's other inputs. */
class ReportInputsTest {

    @Test
    void sha256MatchesThePublishedExample() {
        // FIPS 180-2, Appendix B.1: SHA-256("abc").
        assertEquals("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad",
                ReportInputs.InputDigest.ofText("abc.txt", "abc").sha256());
    }

    @Test
    void digestsAreKeptInLowerCase() {
        String upper = "BA7816BF8F01CFEA414140DE5DAE2223B00361A396177A9CB410FF61F20015AD";
        assertEquals(upper.toLowerCase(Locale.ROOT), new ReportInputs.InputDigest("a", upper).sha256());
    }

    @Test
    void rejectsSomethingThatIsNotADigest() {
        assertThrows(IllegalArgumentException.class, () -> new ReportInputs.InputDigest("a", "abc"));
        assertThrows(IllegalArgumentException.class, () -> new ReportInputs.InputDigest("a", "g".repeat(64)));
        assertThrows(IllegalArgumentException.class, () -> new ReportInputs.InputDigest("a", null));
    }

    @Test
    void listsAreCopied() {
        List<String> cautions = new ArrayList<>(List.of("one"));
        ReportInputs in = new ReportInputs("1", cautions, List.of());
        cautions.add("two");
        assertEquals(List.of("one"), in.cautions());
        assertThrows(UnsupportedOperationException.class, () -> in.cautions().add("three"));
    }
}
