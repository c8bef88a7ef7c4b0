package org.tjmargin.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.tjmargin.derating.Policy;
import org.tjmargin.design.DesignLoader;
import org.tjmargin.design.InputException;
import org.tjmargin.design.InputFile;
import org.tjmargin.design.InputProblem;
import org.tjmargin.design.LoadedDesign;
import org.tjmargin.design.LoadedPolicy;
import org.tjmargin.design.ProfileLoader;
import org.tjmargin.report.Cautions;
import org.tjmargin.report.ChartSet;
import org.tjmargin.report.ChartSize;
import org.tjmargin.report.HtmlReport;
import org.tjmargin.report.OutputFiles;
import org.tjmargin.report.RenderedChart;
import org.tjmargin.report.RenderingWarmUp;
import org.tjmargin.report.ReportDetail;
import org.tjmargin.report.ReportInputs;
import org.tjmargin.report.ResultsJson;
import org.tjmargin.report.StatisticsCsv;
import org.tjmargin.report.SummaryTable;
import org.tjmargin.report.SweepCsv;
import org.tjmargin.solve.Analysis;
import org.tjmargin.solve.AnalysisResult;
import org.tjmargin.solve.SolverSettings;
import org.tjmargin.variation.statistical.StatisticalAnalysis;
import org.tjmargin.variation.statistical.StatisticsPlan;
import org.tjmargin.variation.statistical.StatisticsResult;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine;

/** {@code tjmargin analyse DESIGN}: analyses a design file and writes its results. */
@Command(name = "analyse", aliases = "analyze", mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        description = {"Analyses a design file (YAML or JSON, by extension): every position at every worst-case corner "
            + "over the design's ambient range, held against the policy; with statistics (a 'statistics' block in the "
            + "design, or --samples) also Monte Carlo, root-sum-square spread, sensitivity ranking and yield.",
            "Prints a summary table and writes results.json, sweep.csv, report.html and the charts into the output "
                + "folder."})
public final class AnalyseCommand implements Callable<Integer> {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Parameters(index = "0", paramLabel = "DESIGN", description = "the design file (.yaml, .yml or .json)")
    Path design;

    @Option(names = "--out", paramLabel = "DIR", defaultValue = "out",
            description = "output folder (default: ${DEFAULT-VALUE})")
    Path out;

    @Option(names = "--json", description = "print the results JSON on standard output instead of the table")
    boolean json;

    @Option(names = "--policy", paramLabel = "NAME|FILE",
            description = {"derating profile to apply, overriding the design's 'policy': the name of a shipped "
                + "profile (see 'tjmargin profiles') or a profile file.",
                "Default: the design's choice, else " + DEFAULT_POLICY + ". The built-in minimum (Tj below Tj max, "
                    + "Zener current at or above Izk) always applies as well."})
    String policyOption;

    @Option(names = "--samples", paramLabel = "N",
            description = {"run the statistics with N Monte Carlo samples per run, whether or not the design has a "
                + "'statistics' block (default: the design's, else " + StatisticsPlan.DEFAULT_SAMPLES + ")."})
    Long samples;

    @Option(names = "--seed", paramLabel = "S",
            description = "seed of the statistics' random streams, overriding the design's (same seed, same "
                + "results, whatever the number of cores)")
    Long seed;

    @Option(names = "--no-statistics", description = "skip the statistics even where the design asks for them")
    boolean noStatistics;

    @Option(names = "--detail", paramLabel = "N", defaultValue = "" + ReportDetail.DEFAULT_LIMIT,
            description = {"detail the N positions of least margin, failing, runaway and unresolved ones first: their "
                + "rows in the table printed here, their sections and charts in report.html, every rule at every "
                + "ambient and every corner in results.json (default: ${DEFAULT-VALUE}; 0 for none).",
                "Every position stays in report.html's verdict table, in results.json (verdict, margin, maximum "
                    + "ambient, the hottest and least-current corner at every ambient) and in sweep.csv."})
    int detail;

    @Option(names = {"-q", "--quiet"}, description = "no progress bar (it is shown only on an interactive console "
        + "and only for runs longer than about a second)")
    boolean quiet;

    /** The profile applied when neither the command line nor the design names one. */
    static final String DEFAULT_POLICY = "general-commercial";

    @Override
    public Integer call() {
        // Chart and report start-up on the second core while the first reads the files (changes no output).
        RenderingWarmUp.startInBackground();
        PrintWriter err = spec.commandLine().getErr();
        PrintWriter stdout = spec.commandLine().getOut();
        LoadedDesign loaded;
        try {
            loaded = DesignLoader.load(design);
        } catch (InputException e) {
            return invalid(err, e);
        }
        LoadedPolicy loadedPolicy;
        try {
            if (policyOption != null) {
                loadedPolicy = ProfileLoader.resolve(policyOption, null);
            } else {
                Path base = loaded.designFile().path().toAbsolutePath().getParent();
                loadedPolicy = ProfileLoader.resolve(loaded.policy().orElse(DEFAULT_POLICY), base);
            }
        } catch (InputException e) {
            return invalid(err, e);
        }
        if (detail < 0) {
            err.println("--detail: expected a whole number of positions, 0 or more, got " + detail
                    + "; nothing written");
            return ExitCodes.INVALID_INPUT;
        }
        if (samples != null && (samples < 1 || samples > 1_000_000_000L)) {
            err.println("--samples: expected a whole number from 1 to 1000000000, got " + samples + "; nothing written");
            return ExitCodes.INVALID_INPUT;
        }
        Policy policy = loadedPolicy.policy().withBuiltInMinimum();
        AnalysisResult result;
        Optional<StatisticsResult> stats = Optional.empty();
        boolean runStatistics = !noStatistics && (loaded.statistics().isPresent() || samples != null);
        List<String> cautions;
        String resultsJson;
        List<RenderedChart> charts;
        ReportDetail detailed;
        // The bar stays up until every file is written and is cleared before the table is printed.
        try (ProgressBar progress = ProgressBar.start(err, !quiet && System.console() != null)) {
            progress.phase("corner analysis");
            result = Analysis.run(loaded.board(), policy, SolverSettings.DEFAULT, progress);
            if (runStatistics) {
                progress.phase("statistics");
                StatisticsPlan plan = loaded.statisticsWith(Optional.ofNullable(samples), Optional.ofNullable(seed));
                stats = Optional.of(StatisticalAnalysis.run(result, plan, SolverSettings.DEFAULT, progress));
            }
            progress.phase("results.json");
            cautions = Cautions.forResult(result);
            List<InputFile> allInputs = new java.util.ArrayList<>(loaded.inputs());
            allInputs.addAll(loadedPolicy.inputs());
            ReportInputs provenance = new ReportInputs(VersionProvider.version(), cautions, allInputs.stream()
                    .map(f -> new ReportInputs.InputDigest(f.path().toString(), f.sha256())).toList());
            detailed = ReportDetail.leastMargin(result, detail);
            resultsJson = ResultsJson.render(result, stats, provenance, detailed);
            progress.phase(ProgressBar.CHART_PHASE);
            charts = ChartSet.render(result, stats, ChartSize.DEFAULT, detailed, progress);
            progress.phase("sweep.csv and report");
            OutputFiles files = new OutputFiles()
                    .text("results.json", resultsJson)
                    .pieces("sweep.csv", SweepCsv.renderUtf8(result))
                    .text("report.html", HtmlReport.render(result, stats, provenance, charts, detailed));
            if (stats.isPresent()) {
                files.text("spread.csv", StatisticsCsv.spread(stats.get()))
                        .text("yield.csv", StatisticsCsv.yield(stats.get()))
                        .text("sensitivity.csv", StatisticsCsv.sensitivity(result, stats.get()));
            }
            for (RenderedChart c : charts) {
                files.pieces(c.pngFileName(), List.of(c.png())).text(c.svgFileName(), c.svg());
            }
            progress.phase("writing");
            List<Path> inputs = allInputs.stream().map(InputFile::path).toList();
            Path clash = files.wouldOverwrite(out, inputs);
            if (clash != null) {
                progress.close();
                err.println(out + ": the output folder would overwrite the input file " + clash
                        + "; choose another --out; nothing written");
                return ExitCodes.INVALID_INPUT;
            }
            files.writeTo(out);
        } catch (IOException e) {
            err.println("tjmargin: cannot write into " + out + ": " + e.getMessage());
            return ExitCodes.INVALID_INPUT;
        }
        if (json) {
            stdout.print(resultsJson);
        } else {
            stdout.print(SummaryTable.render(result, stats, cautions, detailed));
            stdout.println("written into " + out + ": results.json, sweep.csv, "
                    + (stats.isPresent() ? "spread.csv, yield.csv, sensitivity.csv, " : "") + "report.html and "
                    + charts.size() + " charts (PNG and SVG)");
        }
        stdout.flush();
        return ExitCodes.of(result.verdict());
    }

    /** Prints every input problem, one per line, and returns the invalid-input status. */
    static int invalid(PrintWriter err, InputException e) {
        for (InputProblem p : e.problems()) {
            err.println(p.format());
        }
        err.println("tjmargin: " + e.problems().size() + " problem" + (e.problems().size() == 1 ? "" : "s")
                + " in the input; nothing written");
        err.flush();
        return ExitCodes.INVALID_INPUT;
    }
}
