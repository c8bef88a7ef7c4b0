package org.tjmargin.cli;

import java.io.PrintWriter;
import java.util.Locale;
import java.util.concurrent.Executors;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.TimeUnit;
import java.util.function.LongSupplier;
import org.tjmargin.report.ChartSet;
import org.tjmargin.solve.AnalysisProgress;
import org.tjmargin.variation.statistical.StatisticsProgress;

/**
 * A one-line progress bar on standard error, redrawn in place with a carriage return: the phase, a bar where the
 * phase can say how far it is (the corner analysis's sweep in ambients and its searches in positions, the
 * statistics in samples, the charts in charts) and the time so far. It appears only once the run has
 * taken {@link #SHOW_AFTER_NS} (a quick run prints nothing) and only when enabled: the command enables it when
 * the console is interactive and {@code --quiet} is not given, so a redirected or piped run never carries it.
 * The line is cleared when the run ends.
 *
 * <p>Thread-safe: {@link #advanced}, {@link #ambientsSwept}, {@link #positionsSearched} and {@link #chartsDrawn} are
 * called from worker threads, drawing happens on one timer thread and under this object's lock.
 */
final class ProgressBar implements AnalysisProgress, StatisticsProgress, ChartSet.Progress, AutoCloseable {

    /** The corner analysis's phase while it sweeps the ambients. */
    static final String SWEEP_PHASE = "corner analysis, sweep";
    /** The corner analysis's phase while it searches each position's maximum ambient and runaway onset. */
    static final String SEARCH_PHASE = "corner analysis, maximum ambient";
    /** The phase that draws the charts. */
    static final String CHART_PHASE = "charts";

    /** The run must take this long before the bar appears: about a second (1 s). */
    static final long SHOW_AFTER_NS = 1_000_000_000L;

    /** Redraw period (ms): often enough to look alive, rare enough to cost nothing. */
    static final long REDRAW_MS = 200;

    static final int BAR_WIDTH = 24;

    private final PrintWriter err;
    private final LongSupplier clockNs;
    private final long startNs;
    private final ScheduledExecutorService timer;
    private volatile String phase = "";
    private volatile double fraction = Double.NaN;
    private int drawnWidth;
    private boolean closed;

    private ProgressBar(PrintWriter err, LongSupplier clockNs, boolean withTimer) {
        this.err = err;
        this.clockNs = clockNs;
        this.startNs = clockNs.getAsLong();
        if (withTimer) {
            timer = Executors.newSingleThreadScheduledExecutor(r -> {
                Thread t = new Thread(r, "tjmargin-progress");
                t.setDaemon(true);
                return t;
            });
            timer.scheduleAtFixedRate(this::draw, REDRAW_MS, REDRAW_MS, TimeUnit.MILLISECONDS);
        } else {
            timer = null;
        }
    }

    /** A bar that draws on its own timer when {@code enabled}, else one that never prints. */
    static ProgressBar start(PrintWriter err, boolean enabled) {
        return enabled ? new ProgressBar(err, System::nanoTime, true) : new ProgressBar(null, System::nanoTime, false);
    }

    /** A bar without a timer, drawn by explicit {@link #draw} calls: for tests. */
    static ProgressBar manual(PrintWriter err, LongSupplier clockNs) {
        return new ProgressBar(err, clockNs, false);
    }

    /** Starts a phase whose progress is not counted (shown with the time only). */
    void phase(String name) {
        phase = name;
        fraction = Double.NaN;
    }

    @Override
    public void ambientsSwept(int done, int total) {
        counted(SWEEP_PHASE, done, total);
    }

    @Override
    public void positionsSearched(int done, int total) {
        counted(SEARCH_PHASE, done, total);
    }

    @Override
    public void chartsDrawn(int done, int total) {
        counted(CHART_PHASE, done, total);
    }

    /**
     * The phase and its fraction together. Workers report out of order, so a count lower than the one shown is
     * kept from moving the bar back within one phase.
     */
    private synchronized void counted(String name, long done, long total) {
        double f = total <= 0 ? Double.NaN : Math.min(1.0, (double) done / total);
        if (!name.equals(phase) || Double.isNaN(fraction) || !(f < fraction)) {
            phase = name;
            fraction = f;
        }
    }

    @Override
    public void advanced(long samplesDone, long samplesTotal) {
        fraction = samplesTotal <= 0 ? Double.NaN : Math.min(1.0, (double) samplesDone / samplesTotal);
    }

    /** Draws the line now if the run has lasted long enough. */
    synchronized void draw() {
        if (err == null || closed) {
            return;
        }
        long elapsed = clockNs.getAsLong() - startNs;
        if (elapsed < SHOW_AFTER_NS) {
            return;
        }
        String line = line(phase, fraction, elapsed / 1e9);
        int pad = Math.max(0, drawnWidth - line.length());
        err.print("\r" + line + " ".repeat(pad));
        err.flush();
        drawnWidth = line.length();
    }

    /** The text of one line: {@code tjmargin: statistics [#####-----]  42 %  3.1 s}. */
    static String line(String phase, double fraction, double seconds) {
        StringBuilder sb = new StringBuilder("tjmargin: ").append(phase);
        if (!Double.isNaN(fraction)) {
            int filled = (int) Math.round(fraction * BAR_WIDTH);
            sb.append(" [").append("#".repeat(filled)).append("-".repeat(BAR_WIDTH - filled)).append("] ")
                    .append(String.format(Locale.ROOT, "%3d %%", (int) Math.floor(100 * fraction)));
        }
        sb.append(String.format(Locale.ROOT, "  %.1f s", seconds));
        return sb.toString();
    }

    /** Stops drawing and clears the line if one was drawn. */
    @Override
    public synchronized void close() {
        closed = true;
        if (timer != null) {
            timer.shutdownNow();
        }
        if (err != null && drawnWidth > 0) {
            err.print("\r" + " ".repeat(drawnWidth) + "\r");
            err.flush();
            drawnWidth = 0;
        }
    }
}
