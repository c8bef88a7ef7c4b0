package org.tjmargin.circuit;

import org.tjmargin.variation.Extreme;
import org.tjmargin.variation.Range;

/** The regulator's load over its range: a current range or a resistance range. */
public sealed interface LoadRange permits LoadRange.Current, LoadRange.Resistive {

    /** The load at an extreme of the LOAD axis: HIGH is the heaviest load. */
    Load at(Extreme heaviness);

    /** True when the load varies. */
    boolean varies();

    /** The range of the LOAD axis in the load's own unit: current (A) or resistance (Ω). */
    Range range();

    /** The load at {@code value} of its {@link #range()} (A for a current load, Ω for a resistive one). */
    Load atValue(double value);

    /**
     * A current load between {@code currentA.lo()} and {@code currentA.hi()}.
     *
     * @param currentA load current (A), ≥ 0
     */
    record Current(Range currentA) implements LoadRange {
        public Current {
            if (!(currentA.lo() >= 0)) {
                throw new IllegalArgumentException("load current must be ≥ 0, got " + currentA.lo() + " A");
            }
        }

        @Override
        public Load at(Extreme heaviness) {
            return new Load.Current(currentA.at(heaviness));
        }

        @Override
        public boolean varies() {
            return currentA.varies();
        }

        @Override
        public Range range() {
            return currentA;
        }

        @Override
        public Load atValue(double value) {
            return new Load.Current(value);
        }
    }

    /**
     * A resistive load between {@code ohm.lo()} (heaviest) and {@code ohm.hi()} (lightest).
     *
     * @param ohm load resistance (Ω), > 0
     */
    record Resistive(Range ohm) implements LoadRange {
        public Resistive {
            if (!(ohm.lo() > 0)) {
                throw new IllegalArgumentException("load resistance must be > 0, got " + ohm.lo() + " Ω");
            }
        }

        @Override
        public Load at(Extreme heaviness) {
            Extreme e = switch (heaviness) {
                case HIGH -> Extreme.LOW;
                case LOW -> Extreme.HIGH;
                case NOMINAL -> Extreme.NOMINAL;
            };
            return new Load.Resistive(ohm.at(e));
        }

        @Override
        public boolean varies() {
            return ohm.varies();
        }

        @Override
        public Range range() {
            return ohm;
        }

        @Override
        public Load atValue(double value) {
            return new Load.Resistive(value);
        }
    }
}
