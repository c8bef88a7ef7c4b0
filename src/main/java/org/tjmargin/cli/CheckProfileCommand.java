package org.tjmargin.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.tjmargin.derating.Policy;
import org.tjmargin.design.InputException;
import org.tjmargin.design.ProfileLoader;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;

/** {@code tjmargin check-profile FILE}: validates one derating profile file. */
@Command(name = "check-profile", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = {"Validates a derating profile file (and the profiles it extends) without analysing anything.",
            "Exit status 0 when valid (its rules are listed), 2 with one located message per problem."})
public final class CheckProfileCommand implements Callable<Integer> {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE", description = "the profile file (.yaml, .yml or .json)")
    Path file;

    @Override
    public Integer call() {
        try {
            Policy p = ProfileLoader.load(file).policy();
            PrintWriter out = spec.commandLine().getOut();
            out.println(file + ": valid profile '" + p.name() + "' with " + p.rules().size() + " rules");
            p.rules().forEach(r -> out.println("    " + r.id() + ": " + r.limit().describe(r.measure().isTemperature())));
            out.flush();
            return ExitCodes.PASS;
        } catch (InputException e) {
            return AnalyseCommand.invalid(spec.commandLine().getErr(), e);
        }
    }
}
