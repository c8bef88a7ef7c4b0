package org.tjmargin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.concurrent.atomic.AtomicLong;
import org.junit.jupiter.api.Test;

class ProgressBarTest {

    @Test
    void aQuickRunPrintsNothing() {
        StringWriter sink = new StringWriter();
        AtomicLong now = new AtomicLong();
        try (ProgressBar bar = ProgressBar.manual(new PrintWriter(sink), now::get)) {
            bar.phase("corner analysis");
            now.set(ProgressBar.SHOW_AFTER_NS - 1);
            bar.draw();
        }
        assertEquals("", sink.toString());
    }

    @Test
    void aLongRunShowsItsPhaseAndFractionThenClearsTheLine() {
        StringWriter sink = new StringWriter();
        AtomicLong now = new AtomicLong();
        try (ProgressBar bar = ProgressBar.manual(new PrintWriter(sink), now::get)) {
            bar.phase("statistics");
            bar.advanced(250, 1000);
            now.set(2_500_000_000L);
            bar.draw();
            String shown = sink.toString();
            assertTrue(shown.startsWith("\rtjmargin: statistics [######------------------]  25 %  2.5 s"), shown);
        }
        assertTrue(sink.toString().endsWith("\r"), "the line is blanked at the end");
    }

    @Test
    void aDisabledBarNeverPrints() {
        StringWriter sink = new StringWriter();
        try (ProgressBar bar = ProgressBar.start(new PrintWriter(sink), false)) {
            bar.advanced(1, 2);
            bar.draw();
        }
        assertEquals("", sink.toString());
    }

    @Test
    void aPhaseWithoutACountShowsTheTimeOnly() {
        assertEquals("tjmargin: corner analysis  1.2 s", ProgressBar.line("corner analysis", Double.NaN, 1.2));
        assertEquals("tjmargin: x [########################] 100 %  0.0 s", ProgressBar.line("x", 1.0, 0));
    }

    @Test
    void theCornerAnalysisCountsItsAmbientsThenItsPositionsAndNeverMovesBack() {
        StringWriter sink = new StringWriter();
        AtomicLong now = new AtomicLong();
        try (ProgressBar bar = ProgressBar.manual(new PrintWriter(sink), now::get)) {
            now.set(2_000_000_000L);
            bar.phase("corner analysis");
            bar.ambientsSwept(50, 100);
            assertEquals("tjmargin: corner analysis, sweep [############------------]  50 %  2.0 s",
                    drawn(bar, sink));
            // A worker that reports late (a smaller count) does not move the bar back.
            bar.ambientsSwept(49, 100);
            assertEquals("tjmargin: corner analysis, sweep [############------------]  50 %  2.0 s",
                    drawn(bar, sink));
            // The searches start their own count.
            bar.positionsSearched(1, 1000);
            assertEquals("tjmargin: corner analysis, maximum ambient [------------------------]   0 %  2.0 s",
                    drawn(bar, sink));
            bar.positionsSearched(750, 1000);
            assertEquals("tjmargin: corner analysis, maximum ambient [##################------]  75 %  2.0 s",
                    drawn(bar, sink));
            // A phase without a count shows the time only; the charts count again.
            bar.phase("results.json");
            assertEquals("tjmargin: results.json  2.0 s", drawn(bar, sink));
            bar.phase(ProgressBar.CHART_PHASE);
            bar.chartsDrawn(19, 76);
            assertEquals("tjmargin: charts [######------------------]  25 %  2.0 s", drawn(bar, sink));
        }
    }

    /** Draws the bar and returns the line it drew (the text after the last carriage return, padding removed). */
    private static String drawn(ProgressBar bar, StringWriter sink) {
        bar.draw();
        String all = sink.toString();
        return all.substring(all.lastIndexOf('\r') + 1).stripTrailing();
    }
}
