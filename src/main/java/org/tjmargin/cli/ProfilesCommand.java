package org.tjmargin.cli;

import java.io.PrintWriter;
import java.util.concurrent.Callable;
import org.tjmargin.derating.Policy;
import org.tjmargin.derating.Rule;
import org.tjmargin.design.ProfileLoader;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/** {@code tjmargin profiles}: lists the shipped derating profiles with their rules and provenance. */
@Command(name = "profiles", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = "Lists the shipped derating profiles, each rule with its limit and where it comes from.")
public final class ProfilesCommand implements Callable<Integer> {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @CommandLine.Option(names = "--brief", description = "names and provenance only, no rules")
    boolean brief;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        for (String name : ProfileLoader.SHIPPED) {
            Policy p = ProfileLoader.shipped(name).policy();
            out.println(name + " — " + p.provenance());
            if (!brief) {
                for (Rule r : p.rules()) {
                    out.println("    " + r.id() + ": " + r.title() + " [" + r.measure().key() + " "
                            + (r.bound() == org.tjmargin.derating.Bound.MAX ? "≤ " : "≥ ") + r.limit().describe(r.measure().isTemperature())
                            + "] — " + r.provenance());
                }
            }
        }
        out.println("The built-in minimum (Tj below Tj max, Zener current at or above Izk) applies with every profile.");
        out.flush();
        return ExitCodes.PASS;
    }
}
