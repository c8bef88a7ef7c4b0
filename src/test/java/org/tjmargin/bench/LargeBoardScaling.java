package org.tjmargin.bench;

import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.tjmargin.derating.Policy;
import org.tjmargin.design.DesignLoader;
import org.tjmargin.design.LargeBoardGenerator;
import org.tjmargin.design.ProfileLoader;
import org.tjmargin.solve.Analysis;
import org.tjmargin.solve.Board;
import org.tjmargin.solve.SolverSettings;

/**
 * The large-board measurement of DEVELOPERS.md ("Benchmarks"): boards of several sizes from
 * {@link LargeBoardGenerator} (one sealed box, 100-point sweep), each analysed end to end by the shipped jar in a fresh
 * JVM ({@code java -jar target/tjmargin.jar analyse BOARD --out DIR -q}, wall time, median of the runs) and in this JVM
 * without start-up (the analysis alone, {@code Analysis.run}, after a warm-up; wall and process CPU time, medians),
 * then the exponent of a least-squares fit of {@code log(time)} against {@code log(positions)}.
 *
 * <p>A command, not a test: timings on a shared machine are noisy, and speed targets are never asserted by tests.
 * Usage (after {@code mvn -B package}, from the project root):
 * <pre>
 * mvn -B -q test-compile dependency:build-classpath -Dmdep.outputFile=target/cp.txt -Dmdep.includeScope=test
 * java -cp target/test-classes:target/classes:$(cat target/cp.txt) org.tjmargin.bench.LargeBoardScaling \
 *     [--sizes 125,250,500,1000] [--runs 5] [--seed 1] [--work /tmp/large-boards] [--jar target/tjmargin.jar]
 * </pre>
 */
public final class LargeBoardScaling {

    private LargeBoardScaling() {
    }

    public static void main(String[] args) throws Exception {
        int[] sizes = {125, 250, 500, 1000};
        int runs = 5;
        long seed = 1;
        Path work = Path.of(System.getProperty("java.io.tmpdir"), "tjmargin-large-boards");
        Path jar = Path.of("target/tjmargin.jar");
        for (int k = 0; k < args.length; k++) {
            switch (args[k]) {
                case "--sizes" -> sizes = Arrays.stream(args[++k].split(",")).mapToInt(Integer::parseInt).toArray();
                case "--runs" -> runs = Integer.parseInt(args[++k]);
                case "--seed" -> seed = Long.parseLong(args[++k]);
                case "--work" -> work = Path.of(args[++k]);
                case "--jar" -> jar = Path.of(args[++k]);
                default -> {
                    System.err.println("unknown argument " + args[k]);
                    System.exit(2);
                }
            }
        }
        Files.createDirectories(work);
        List<Path> designs = new ArrayList<>();
        for (int n : sizes) {
            designs.add(LargeBoardGenerator.write(n, seed, LargeBoardGenerator.demoParts(),
                    work.resolve("board-" + n + ".yaml")));
        }
        double[] whole = new double[sizes.length];
        for (int s = 0; s < sizes.length; s++) {
            double[] t = new double[runs];
            for (int r = 0; r < runs; r++) {
                t[r] = wholeProcessSeconds(jar, designs.get(s), work.resolve("out-" + sizes[s]));
            }
            whole[s] = median(t);
            System.out.printf(Locale.ROOT, "whole process, %5d positions: median %.2f s of %s%n", sizes[s], whole[s],
                    Arrays.toString(round(t)));
        }
        Policy policy = ProfileLoader.resolve("general-commercial", null).policy().withBuiltInMinimum();
        List<Board> boards = new ArrayList<>();
        for (Path d : designs) {
            boards.add(DesignLoader.load(d).board());
        }
        Analysis.run(boards.get(boards.size() / 2), policy, SolverSettings.DEFAULT); // warm-up of the JIT
        double[] wall = new double[sizes.length];
        double[] cpu = new double[sizes.length];
        for (int s = 0; s < sizes.length; s++) {
            double[] tw = new double[runs];
            double[] tc = new double[runs];
            for (int r = 0; r < runs; r++) {
                long c0 = processCpuNanos();
                long w0 = System.nanoTime();
                Analysis.run(boards.get(s), policy, SolverSettings.DEFAULT);
                tw[r] = (System.nanoTime() - w0) / 1e9;
                tc[r] = (processCpuNanos() - c0) / 1e9;
            }
            wall[s] = median(tw);
            cpu[s] = median(tc);
            System.out.printf(Locale.ROOT, "analysis in process, %5d positions: median wall %.2f s, CPU %.2f s%n",
                    sizes[s], wall[s], cpu[s]);
        }
        System.out.println();
        System.out.println("| positions | whole process (median) | analysis, wall (median) | analysis, CPU (median) |");
        System.out.println("| --- | --- | --- | --- |");
        for (int s = 0; s < sizes.length; s++) {
            System.out.printf(Locale.ROOT, "| %d | %.2f s | %.2f s | %.2f s |%n", sizes[s], whole[s], wall[s], cpu[s]);
        }
        System.out.printf(Locale.ROOT, "exponent of time in positions (least squares of log t on log N): whole "
                + "process %.2f, analysis wall %.2f, analysis CPU %.2f%n", exponent(sizes, whole),
                exponent(sizes, wall), exponent(sizes, cpu));
    }

    private static double wholeProcessSeconds(Path jar, Path design, Path out) throws IOException,
            InterruptedException {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        ProcessBuilder pb = new ProcessBuilder(java, "-jar", jar.toString(), "analyse", design.toString(), "--out",
                out.toString(), "-q").redirectErrorStream(true).redirectOutput(ProcessBuilder.Redirect.DISCARD);
        long t0 = System.nanoTime();
        int status = pb.start().waitFor();
        double s = (System.nanoTime() - t0) / 1e9;
        if (status > 1) {
            throw new IllegalStateException(design + ": exit status " + status);
        }
        return s;
    }

    private static long processCpuNanos() {
        return ((com.sun.management.OperatingSystemMXBean) ManagementFactory.getOperatingSystemMXBean())
                .getProcessCpuTime();
    }

    static double median(double[] v) {
        double[] s = v.clone();
        Arrays.sort(s);
        int n = s.length;
        return n % 2 == 1 ? s[n / 2] : 0.5 * (s[n / 2 - 1] + s[n / 2]);
    }

    /** The slope of the least-squares line through {@code (log N, log t)}. */
    static double exponent(int[] n, double[] t) {
        int m = n.length;
        double sx = 0;
        double sy = 0;
        double sxx = 0;
        double sxy = 0;
        for (int i = 0; i < m; i++) {
            double x = Math.log(n[i]);
            double y = Math.log(t[i]);
            sx += x;
            sy += y;
            sxx += x * x;
            sxy += x * y;
        }
        return (m * sxy - sx * sy) / (m * sxx - sx * sx);
    }

    private static String[] round(double[] t) {
        return Arrays.stream(t).mapToObj(v -> String.format(Locale.ROOT, "%.2f", v)).toArray(String[]::new);
    }
}
