package org.tjmargin.design;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.Random;

/**
 * Writes large INVENTED designs for tests and benchmarks: {@code N} positions on one board in one sealed box, made
 * of the demo's invented parts ({@code demo/parts.yaml}), with a 100-point ambient sweep from −20 °C to 55 °C.
 * Deterministic: the same size and seed give the same bytes.
 *
 * <p>The mix is the one a large interface or backplane board might have: mostly small reference Zeners fed from
 * current sources (60 %), 12 V shunt regulators from the 24 V supply (25 %), standoff clamps across 24 V lines (the
 * rest), and about 1 % surge-rated input clamps facing a combination-wave surge and load dumps, like the demo's D4
 * (at least one). Every value is drawn from a range around the demo's own choices (the demo's D1 sits near its
 * limit at 55 °C with 390 Ω; the generated regulators use 470 … 820 Ω with loads that leave the Zener its knee
 * current at the lowest supply, so most pass and a few come close). The box
 * grows with the board (0.0025 m² of surface and 20 mW of other electronics per position) so that its air rises
 * by some 10 to 20 K whatever the size, as a real enclosure would be sized.
 *
 * <p>Command line: {@code LargeBoardGenerator POSITIONS SEED OUT.yaml [PARTS.yaml]}; the parts path is written
 * into the design as given (default: the absolute path of {@code demo/parts.yaml}).
 */
public final class LargeBoardGenerator {

    /** Sweep points of every generated design (issue 5: a 100-point sweep). */
    public static final int SWEEP_POINTS = 100;

    private static final int[] SERIES_RESISTORS_OHM = {470, 510, 560, 620, 680, 750, 820};
    private static final int[] REFERENCE_COPPER_MM2 = {10, 20, 50, 100};
    private static final int[] CLAMP_COPPER_MM2 = {50, 100, 200};

    private LargeBoardGenerator() {
    }

    /** The kinds of position the generator places. */
    public enum Kind {
        /** A reference Zener fed from a current source. */
        REFERENCE,
        /** A 12 V shunt regulator from the 24 V supply. */
        REGULATOR,
        /** A clamp across a 24 V line at its standoff voltage. */
        STANDOFF_CLAMP,
        /** A surge-rated clamp on a 12 V vehicle-style input, facing surges. */
        SURGE_CLAMP
    }

    /** How many positions of each kind a board of {@code n} gets, in {@link Kind} order. */
    public static int[] mix(int n) {
        if (n < 1) {
            throw new IllegalArgumentException("a board needs at least one position, got " + n);
        }
        int surge = Math.max(1, (int) Math.round(0.01 * n));
        int regulators = (int) Math.round(0.25 * n);
        int references = (int) Math.round(0.60 * n);
        regulators = Math.min(regulators, n - surge);
        references = Math.min(references, n - surge - regulators);
        return new int[] {references, regulators, n - surge - regulators - references, surge};
    }

    /** The kind of every position, in board order. */
    public static List<Kind> kinds(int n, long seed) {
        int[] counts = mix(n);
        List<Kind> kinds = new ArrayList<>(n);
        for (Kind k : Kind.values()) {
            for (int c = 0; c < counts[k.ordinal()]; c++) {
                kinds.add(k);
            }
        }
        Collections.shuffle(kinds, new Random(seed));
        return kinds;
    }

    /**
     * The design's text.
     *
     * @param n         number of positions, ≥ 1
     * @param seed      seed of the draws
     * @param partsPath the parts library path to write into the design
     */
    public static String yaml(int n, long seed, String partsPath) {
        List<Kind> kinds = kinds(n, seed);
        Random rnd = new Random(seed ^ 0x5DEECE66DL);
        StringBuilder sb = new StringBuilder(300 * n + 1000);
        sb.append("# INVENTED large board written by LargeBoardGenerator (test sources): ").append(n)
                .append(" positions, seed ").append(seed).append(". It describes no real product.\n");
        sb.append("design: large-board-").append(n).append("-seed-").append(seed).append('\n');
        sb.append("parts: ").append(quoted(partsPath)).append('\n');
        sb.append("policy: general-commercial\n");
        sb.append("ambient: {min: -20 °C, max: 55 °C, points: ").append(SWEEP_POINTS).append("}\n");
        sb.append("enclosure:\n");
        sb.append(String.format(Locale.ROOT, "  sealed-box: {surface-area: %.4f m², heat-transfer: 6 W/(m²·K), "
                + "other-dissipation: %.3f W}\n", 0.0025 * n, 0.02 * n));
        sb.append("positions:\n");
        for (int i = 0; i < n; i++) {
            String id = String.format(Locale.ROOT, "D%04d", i + 1);
            switch (kinds.get(i)) {
                case REFERENCE -> reference(sb, id, rnd);
                case REGULATOR -> regulator(sb, id, rnd);
                case STANDOFF_CLAMP -> standoffClamp(sb, id, rnd);
                case SURGE_CLAMP -> surgeClamp(sb, id, rnd);
            }
        }
        return sb.toString();
    }

    /** Writes the design to {@code out}, returning it. */
    public static Path write(int n, long seed, String partsPath, Path out) throws IOException {
        Files.writeString(out, yaml(n, seed, partsPath), StandardCharsets.UTF_8);
        return out;
    }

    /** The absolute path of the demo's parts library, from the working directory of a build in the project root. */
    public static String demoParts() {
        return Path.of("demo/parts.yaml").toAbsolutePath().normalize().toString();
    }

    private static void reference(StringBuilder sb, String id, Random rnd) {
        double currentMa = 2.0 + 0.1 * rnd.nextInt(61);
        sb.append("  - id: ").append(id).append('\n');
        sb.append("    part: demo-zener-6v2-smd\n");
        sb.append("    mounting: {copper-area: ").append(pick(REFERENCE_COPPER_MM2, rnd)).append(" mm²}\n");
        sb.append("    circuit:\n");
        sb.append(String.format(Locale.ROOT, "      current-fed: {current: {nominal: %.1f mA, tolerance: %d %%}}\n",
                currentMa, rnd.nextBoolean() ? 5 : 10));
    }

    private static void regulator(StringBuilder sb, String id, Random rnd) {
        int rsOhm = pick(SERIES_RESISTORS_OHM, rnd);
        // Sized as a designer would: at the lowest supply (19.2 V), the resistor 1 % high and the output at its hot
        // worst (about 14 V, from the demo's summary), the load leaves at least 0.5 mA for the Zener, above the
        // policy's 1.5 × Izk (0.375 mA).
        double headroomMa = 1e3 * (19.2 - 14.0) / (1.01 * rsOhm) - 0.5;
        double loadMaxMa = Math.max(2.0, Math.floor(2 * headroomMa * (0.5 + 0.5 * rnd.nextDouble())) / 2);
        double loadMinMa = Math.min(1.0 + rnd.nextInt(3), loadMaxMa / 2);
        sb.append("  - id: ").append(id).append('\n');
        sb.append("    part: demo-zener-12v-1w\n");
        sb.append(String.format(Locale.ROOT, "    mounting: {lead-length: %d mm, tie-point: %d K/W}\n",
                8 + rnd.nextInt(8), 40 + 5 * rnd.nextInt(5)));
        sb.append("    circuit:\n");
        sb.append("      shunt-regulator:\n");
        sb.append("        supply: {min: 19.2 V, nominal: 24 V, max: 28 V}\n");
        sb.append("        series-resistor: {resistor: demo-resistor-film-2w, value: ").append(rsOhm)
                .append(" Ω, tolerance: 1 %}\n");
        sb.append(String.format(Locale.ROOT, "        load: {current: {min: %.1f mA, max: %.1f mA}}\n", loadMinMa,
                loadMaxMa));
        sb.append("    tolerances:\n");
        sb.append("      thermal-resistance: 15 %\n");
    }

    private static void standoffClamp(StringBuilder sb, String id, Random rnd) {
        sb.append("  - id: ").append(id).append('\n');
        sb.append("    part: demo-tvs-28v-smd\n");
        sb.append("    mounting: {copper-area: ").append(pick(CLAMP_COPPER_MM2, rnd)).append(" mm²}\n");
        sb.append("    circuit:\n");
        sb.append("      standoff-clamp: {line: {min: 21.6 V, nominal: 24 V, max: 26.4 V}, source-resistance: 0.5 Ω}\n");
        sb.append("    tolerances:\n");
        sb.append("      thermal-resistance: 15 %\n");
    }

    private static void surgeClamp(StringBuilder sb, String id, Random rnd) {
        sb.append("  - id: ").append(id).append('\n');
        sb.append("    part: demo-tvs-26v-5kw-smd\n");
        sb.append("    mounting: {copper-area: ").append(300 + 100 * rnd.nextInt(3)).append(" mm²}\n");
        sb.append("    circuit:\n");
        sb.append("      standoff-clamp: {line: {min: 10 V, nominal: 14 V, max: 16 V}, source-resistance: 0.1 Ω}\n");
        sb.append("    tolerances:\n");
        sb.append("      thermal-resistance: 15 %\n");
        sb.append("    surges:\n");
        sb.append("      - id: cwg-1kv\n");
        sb.append("        combination-wave: {peak: 1 kV, coupling: 10 Ω}\n");
        sb.append("        repeat: {count: 5, period: 60 s}\n");
        sb.append("        protected-limit: 60 V\n");
        sb.append("      - id: load-dump\n");
        sb.append("        load-dump: {system: 12 V, test: A, us: 79 V, ri: 4 Ω, td: 40 ms}\n");
        sb.append("        repeat: {count: 10, period: 60 s}\n");
        sb.append("        protected-limit: 60 V\n");
    }

    private static int pick(int[] values, Random rnd) {
        return values[rnd.nextInt(values.length)];
    }

    private static String quoted(String s) {
        return "\"" + s.replace("\\", "\\\\").replace("\"", "\\\"") + "\"";
    }

    /**
     * Writes one design.
     *
     * @param args {@code POSITIONS SEED OUT.yaml [PARTS.yaml]}
     */
    public static void main(String[] args) throws IOException {
        if (args.length < 3 || args.length > 4) {
            System.err.println("usage: LargeBoardGenerator POSITIONS SEED OUT.yaml [PARTS.yaml]");
            System.exit(2);
        }
        String parts = args.length == 4 ? Path.of(args[3]).toAbsolutePath().normalize().toString() : demoParts();
        Path out = write(Integer.parseInt(args[0]), Long.parseLong(args[1]), parts, Path.of(args[2]));
        System.out.println("wrote " + out);
    }
}
