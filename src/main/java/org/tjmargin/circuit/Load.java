package org.tjmargin.circuit;

/** What the regulator feeds. */
public sealed interface Load permits Load.Current, Load.Resistive {

    /** The same load drawing {@code factor} times as much. */
    Load scaledBy(double factor);

    /**
     * A load drawing a fixed current, whatever the voltage (a constant-current model of the circuits behind).
     *
     * @param currentA load current (A), ≥ 0
     */
    record Current(double currentA) implements Load {
        public Current {
            if (!(currentA >= 0) || !Double.isFinite(currentA)) {
                throw new IllegalArgumentException("load current must be ≥ 0 and finite, got " + currentA + " A");
            }
        }

        @Override
        public Load scaledBy(double factor) {
            return new Current(currentA * factor);
        }
    }

    /**
     * A resistive load.
     *
     * @param resistanceOhm load resistance (Ω), > 0
     */
    record Resistive(double resistanceOhm) implements Load {
        public Resistive {
            if (!(resistanceOhm > 0) || !Double.isFinite(resistanceOhm)) {
                throw new IllegalArgumentException("load resistance must be > 0 and finite, got " + resistanceOhm
                        + " Ω");
            }
        }

        /** Drawing {@code factor} times the current means {@code 1/factor} times the resistance. */
        @Override
        public Load scaledBy(double factor) {
            return new Resistive(resistanceOhm / factor);
        }
    }
}
