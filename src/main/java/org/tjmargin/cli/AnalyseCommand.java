package org.tjmargin.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.tjmargin.derating.Policy;
import org.tjmargin.design.DesignLoader;
import org.tjmargin.design.InputException;
import org.tjmargin.design.InputFile;
import org.tjmargin.design.InputProblem;
import org.tjmargin.design.LoadedDesign;
import org.tjmargin.report.Cautions;
import org.tjmargin.report.OutputFiles;
import org.tjmargin.report.Provenance;
import org.tjmargin.report.ResultsJson;
import org.tjmargin.report.SummaryTable;
import org.tjmargin.report.SweepCsv;
import org.tjmargin.solve.Analysis;
import org.tjmargin.solve.AnalysisResult;
import org.tjmargin.solve.SolverSettings;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code tjmargin analyse DESIGN}: analyses a design file and writes its results. */
@Command(name = "analyse", aliases = "analyze", mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        description = {"Analyses a design file (YAML or JSON, by extension): every position at every worst-case corner "
            + "over the design's ambient range, held against the policy.",
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

    @Override
    public Integer call() {
        PrintWriter err = spec.commandLine().getErr();
        PrintWriter stdout = spec.commandLine().getOut();
        LoadedDesign loaded;
        try {
            loaded = DesignLoader.load(design);
        } catch (InputException e) {
            for (InputProblem p : e.problems()) {
                err.println(p.format());
            }
            err.println("tjmargin: " + e.problems().size() + " problem" + (e.problems().size() == 1 ? "" : "s")
                    + " in the input; nothing written");
            return ExitCodes.INVALID_INPUT;
        }
        Policy policy = Policy.builtInMinimum();
        AnalysisResult result = Analysis.run(loaded.board(), policy, SolverSettings.DEFAULT);
        List<String> cautions = Cautions.forResult(result);
        Provenance provenance = new Provenance(VersionProvider.version(), loaded.inputs().stream()
                .map(f -> new Provenance.InputDigest(f.path().toString(), f.sha256())).toList());
        String resultsJson = ResultsJson.render(result, cautions, provenance);
        OutputFiles files = new OutputFiles()
                .text("results.json", resultsJson)
                .text("sweep.csv", SweepCsv.render(result));
        try {
            List<Path> inputs = loaded.inputs().stream().map(InputFile::path).toList();
            Path clash = files.wouldOverwrite(out, inputs);
            if (clash != null) {
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
            stdout.print(SummaryTable.render(result, cautions));
            stdout.println("written: " + String.join(", ", files.names()) + " in " + out);
        }
        stdout.flush();
        return ExitCodes.of(result.verdict());
    }
}
