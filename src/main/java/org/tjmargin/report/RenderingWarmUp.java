package org.tjmargin.report;

import java.util.List;
import org.tjmargin.device.Celsius;
import org.tjmargin.device.PowerRatingCurve;
import org.tjmargin.device.RatingReference;

/**
 * Starts, on a background thread, what the first chart and the report would otherwise start on the critical path of
 * a command-line run: the headless Java 2D stack with its font files and glyph caches, the antialiasing rasteriser,
 * the image-writer registry and the PNG writer, JFreeSVG, JFreeChart's classes, and the compiled report template.
 * Measured on a two-core machine, that start-up is about a third of a second of the first chart; reading the design
 * files, which comes first, keeps only one core busy, so the other does it meanwhile.
 *
 * <p>It draws one small chart of invented numbers and keeps nothing: no output depends on it, and a run without it
 * writes the same bytes. A failure here (a runtime without fonts, say) is left to the real rendering to meet and
 * report, so the thread ends silently.
 */
public final class RenderingWarmUp {

    private RenderingWarmUp() {
    }

    /** Starts the warm-up on a daemon thread and returns at once. */
    public static void startInBackground() {
        Thread t = new Thread(RenderingWarmUp::run, "tjmargin-rendering-warm-up");
        t.setDaemon(true);
        t.setUncaughtExceptionHandler((thread, e) -> {
            // Nothing to report: the charts and the report meet the same failure on the main path and say so.
        });
        t.start();
    }

    private static void run() {
        HtmlReport.compileTemplate();
        // Invented numbers: a 1 W rating flat to 50 °C and zero at 150 °C, two operating points.
        PowerRatingCurve curve = PowerRatingCurve.flatThenLinear(RatingReference.AMBIENT, 0, 1.0,
                Celsius.toKelvin(50), Celsius.toKelvin(150));
        ChartRating.Dot a = new ChartRating.Dot(Celsius.toKelvin(40), 0.3);
        ChartRating.Dot b = new ChartRating.Dot(Celsius.toKelvin(80), 0.4);
        ChartRenderer.render("warm-up", ChartKind.RATING, ChartRating.build("warm-up 0.5 °C", "subtitle 1.25 mW",
                "temperature (°C)", curve, "rating", List.of(a, b), "points", b, "last"),
                new ChartSize(ChartSize.MIN_WIDTH_PX, ChartSize.MIN_HEIGHT_PX));
    }
}
