package org.tjmargin.design;

import java.util.Optional;
import org.tjmargin.units.Dimension;
import org.tjmargin.units.Quantities;
import org.tjmargin.units.Quantity;
import org.tjmargin.units.QuantityException;

/** Reading one scalar node as a quantity, a name, a count or a flag, reporting what is wrong with it. */
final class Scalars {

    private Scalars() {
    }

    /**
     * Reads a quantity of one of the allowed dimensions (the first that the unit measures).
     *
     * @param ctx     where to report
     * @param node    the value
     * @param path    its field path
     * @param sign    the sign it must have
     * @param allowed the dimensions accepted
     */
    static Optional<Value> quantity(FileContext ctx, Node node, String path, Sign sign, Dimension... allowed) {
        if (!(node instanceof Node.Scalar s) || s.type() == Node.Scalar.Type.BOOLEAN) {
            ctx.report(InputProblem.Kind.WRONG_TYPE, node, path, "expected a quantity with its unit, such as '"
                    + example(allowed[0]) + "', got " + node.describe());
            return Optional.empty();
        }
        Quantity q;
        try {
            q = Quantities.parseAny(s.text(), allowed);
        } catch (QuantityException e) {
            ctx.report(kindOf(e), node, path, e.getMessage());
            return Optional.empty();
        }
        if (!sign.admits(q.valueSi())) {
            ctx.report(InputProblem.Kind.NOT_PHYSICAL, node, path, "must be " + sign.phrase() + ", got " + s.text());
            return Optional.empty();
        }
        return Optional.of(new Value(q.valueSi(), q.dimension(), node, path));
    }

    /** Reads a name or identifier: any scalar but an empty one, as written. */
    static Optional<String> text(FileContext ctx, Node node, String path) {
        if (!(node instanceof Node.Scalar s) || s.type() == Node.Scalar.Type.EMPTY || s.text().isBlank()) {
            ctx.report(InputProblem.Kind.WRONG_TYPE, node, path, "expected a name, got " + node.describe());
            return Optional.empty();
        }
        return Optional.of(s.text().strip());
    }

    /** Reads a plain count: a bare integer, without unit. */
    static Optional<Integer> integer(FileContext ctx, Node node, String path) {
        if (node instanceof Node.Scalar s && s.text().strip().matches("[+-]?[0-9]{1,9}")) {
            return Optional.of(Integer.parseInt(s.text().strip()));
        }
        ctx.report(InputProblem.Kind.WRONG_TYPE, node, path, "expected a whole number without unit, got "
                + node.describe());
        return Optional.empty();
    }

    /** Reads a flag: {@code true} or {@code false}. */
    static Optional<Boolean> bool(FileContext ctx, Node node, String path) {
        if (node instanceof Node.Scalar s && s.type() == Node.Scalar.Type.BOOLEAN) {
            return Optional.of(Boolean.parseBoolean(s.text().strip().toLowerCase(java.util.Locale.ROOT)));
        }
        ctx.report(InputProblem.Kind.WRONG_TYPE, node, path, "expected true or false, got " + node.describe());
        return Optional.empty();
    }

    private static InputProblem.Kind kindOf(QuantityException e) {
        return switch (e.kind()) {
            case WRONG_DIMENSION -> InputProblem.Kind.WRONG_DIMENSION;
            case NOT_FINITE, BELOW_ABSOLUTE_ZERO -> InputProblem.Kind.NOT_PHYSICAL;
            default -> InputProblem.Kind.BAD_QUANTITY;
        };
    }

    private static String example(Dimension d) {
        return switch (d) {
            case VOLTAGE -> "12 V";
            case CURRENT -> "20 mA";
            case RESISTANCE -> "150 Ω";
            case POWER -> "1 W";
            case TEMPERATURE -> "55 °C";
            case TEMPERATURE_DIFFERENCE -> "10 K";
            case LENGTH -> "9.5 mm";
            case AREA -> "25 mm²";
            case THERMAL_RESISTANCE -> "150 K/W";
            case THERMAL_CONDUCTIVITY -> "401 W/(m·K)";
            case HEAT_TRANSFER_COEFFICIENT -> "6 W/(m²·K)";
            case VOLTAGE_TEMPERATURE_COEFFICIENT -> "2 mV/K";
            case RELATIVE_TEMPERATURE_COEFFICIENT -> "0.05 %/K";
            case POWER_DERATING_SLOPE -> "6.67 mW/K";
            case FRACTION -> "5 %";
            default -> "1 " + d.symbol();
        };
    }
}
