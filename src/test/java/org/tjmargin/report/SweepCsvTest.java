package org.tjmargin.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVPrinter;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.tjmargin.derating.Bound;
import org.tjmargin.derating.Limit;
import org.tjmargin.derating.Measure;
import org.tjmargin.derating.Policy;
import org.tjmargin.derating.Rule;
import org.tjmargin.design.DesignLoader;
import org.tjmargin.design.LoadedDesign;
import org.tjmargin.design.ProfileLoader;
import org.tjmargin.solve.Analysis;
import org.tjmargin.solve.AnalysisResult;
import org.tjmargin.solve.BoardAtAmbient;
import org.tjmargin.solve.CornerPoint;
import org.tjmargin.solve.OperatingPoint;
import org.tjmargin.solve.PositionAtAmbient;
import org.tjmargin.solve.SolverSettings;

/**
 * {@code sweep.csv} as written by {@link SweepCsv#renderUtf8} is, byte for byte, what one Commons CSV printer
 * (RFC 4180, minimal quoting) writes for the same rows: the reference below prints every value through
 * {@link CSVPrinter#printRecord}, as the writer did before it wrote bytes itself. Boards: the demo, a board whose
 * position and rule identifiers need quoting (delimiter, quote, leading comment sign, surrounding spaces, non-ASCII
 * first letter), one with a runaway corner (empty fields) and one failing everywhere.
 */
class SweepCsvTest {

    @Test
    void demoIsWhatThePrinterWrites() {
        LoadedDesign demo = DesignLoader.load(Path.of("demo/design.yaml"));
        Policy policy = ProfileLoader.resolve("general-commercial", null).policy().withBuiltInMinimum();
        assertSameAsPrinter(Analysis.run(demo.board(), policy, SolverSettings.DEFAULT));
    }

    @Test
    void identifiersThatNeedQuotingAreQuotedAsThePrinterQuotesThem() {
        List<Rule> rules = new ArrayList<>(Policy.builtInMinimum().rules());
        rules.add(new Rule("power, half", "invented", Measure.POWER_RATIO, Bound.MAX, new Limit.Fixed(0.5), "test"));
        rules.add(new Rule("#tj \"40\"", "invented", Measure.JUNCTION_TEMPERATURE, Bound.MAX,
                new Limit.BelowTjMax(40.0), "test"));
        Policy odd = new Policy("odd", "invented", rules);
        AnalysisResult r = Analysis.run(ReportFixtures.board("odd", List.of(ReportFixtures.regulator("D1,a"),
                ReportFixtures.reference("#REF \"2\""), ReportFixtures.clamp(" TVS3 "),
                ReportFixtures.reference("Ω4"), ReportFixtures.regulator("D5"))), odd, SolverSettings.DEFAULT);
        byte[] written = joined(SweepCsv.renderUtf8(r));
        assertSameAsPrinter(r);
        // And it reads back: every row has the header's width, the identifiers come back as given.
        List<String> ids = new ArrayList<>();
        try (CSVParser p = CSVParser.parse(new String(written, StandardCharsets.UTF_8),
                CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get())) {
            for (CSVRecord rec : p) {
                assertEquals(SweepCsv.HEADER.length, rec.size(), "row " + rec.getRecordNumber());
                if (!ids.contains(rec.get("position"))) {
                    ids.add(rec.get("position"));
                }
            }
        } catch (IOException e) {
            throw new AssertionError(e);
        }
        assertEquals(List.of("D1,a", "#REF \"2\"", " TVS3 ", "Ω4", "D5"), ids);
    }

    @Test
    void runawayAndFailingBoardsAreWhatThePrinterWrites() {
        AnalysisResult mixed = ReportFixtures.mixed("mixed");
        assertTrue(mixed.sweep().stream().flatMap(b -> b.positions().stream())
                .anyMatch(p -> p.hottest().isPresent() && p.hottest().get().point().isEmpty()),
                "the fixture has a runaway corner, whose row has empty fields");
        assertSameAsPrinter(mixed);
        assertSameAsPrinter(ReportFixtures.hopeless("hopeless"));
        assertSameAsPrinter(ReportFixtures.surgeOnly("surge"));
    }

    private static void assertSameAsPrinter(AnalysisResult r) {
        String expected = reference(r);
        String actual = new String(joined(SweepCsv.renderUtf8(r)), StandardCharsets.UTF_8);
        assertEquals(expected, actual);
        assertEquals(expected, SweepCsv.render(r));
    }

    private static byte[] joined(List<byte[]> pieces) {
        int n = pieces.stream().mapToInt(b -> b.length).sum();
        byte[] all = new byte[n];
        int at = 0;
        for (byte[] b : pieces) {
            System.arraycopy(b, 0, all, at, b.length);
            at += b.length;
        }
        return all;
    }

    /** Every row through one printer, every value through {@code printRecord}. */
    private static String reference(AnalysisResult r) {
        StringBuilder out = new StringBuilder();
        try (CSVPrinter csv = new CSVPrinter(out, CSVFormat.RFC4180.builder().setHeader(SweepCsv.HEADER).get())) {
            for (BoardAtAmbient b : r.sweep()) {
                for (PositionAtAmbient p : b.positions()) {
                    boolean same = p.hottestIndex() == p.leastCurrentIndex();
                    if (p.hottest().isPresent()) {
                        row(csv, b, p, same ? "hottest,least-current" : "hottest", p.hottest().get());
                    }
                    if (!same && p.leastCurrent().isPresent()) {
                        row(csv, b, p, "least-current", p.leastCurrent().get());
                    }
                }
            }
        } catch (IOException e) {
            throw new AssertionError(e);
        }
        return out.toString();
    }

    private static void row(CSVPrinter csv, BoardAtAmbient b, PositionAtAmbient p, String role, CornerPoint c)
            throws IOException {
        OperatingPoint op = c.point().orElse(null);
        csv.printRecord(p.positionId(), SweepCsv.num(Labels.celsius(p.ambientK())),
                b.airBalanced() ? SweepCsv.num(Labels.celsius(p.tLocalK())) : "",
                b.airBalanced() ? SweepCsv.num(b.enclosureRiseK()) : "", c.status().name(),
                SweepCsv.num(p.margin()), p.limitingRuleId(), role, c.corner().label(),
                op == null ? "" : SweepCsv.num(Labels.celsius(op.tjK())),
                op == null ? "" : SweepCsv.num(Labels.celsius(op.referenceK())),
                op == null ? "" : SweepCsv.num(op.circuit().voltageV()),
                op == null ? "" : SweepCsv.num(op.circuit().diodeCurrentA()),
                op == null ? "" : SweepCsv.num(op.diodePowerW()),
                op == null ? "" : SweepCsv.num(op.circuit().resistorPowerW()), SweepCsv.num(c.allowedPowerW()),
                op == null ? "" : SweepCsv.num(op.loopGain()), op == null ? "" : op.evaluations());
    }
}
