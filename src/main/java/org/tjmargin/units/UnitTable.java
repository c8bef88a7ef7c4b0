package org.tjmargin.units;

import static org.tjmargin.units.Dimension.ACTION_INTEGRAL;
import static org.tjmargin.units.Dimension.AREA;
import static org.tjmargin.units.Dimension.CHARGE;
import static org.tjmargin.units.Dimension.CURRENT;
import static org.tjmargin.units.Dimension.ENERGY;
import static org.tjmargin.units.Dimension.FRACTION;
import static org.tjmargin.units.Dimension.FREQUENCY;
import static org.tjmargin.units.Dimension.HEAT_CAPACITY;
import static org.tjmargin.units.Dimension.HEAT_TRANSFER_COEFFICIENT;
import static org.tjmargin.units.Dimension.LENGTH;
import static org.tjmargin.units.Dimension.POWER;
import static org.tjmargin.units.Dimension.POWER_DERATING_SLOPE;
import static org.tjmargin.units.Dimension.RELATIVE_TEMPERATURE_COEFFICIENT;
import static org.tjmargin.units.Dimension.RESISTANCE;
import static org.tjmargin.units.Dimension.TEMPERATURE;
import static org.tjmargin.units.Dimension.TEMPERATURE_DIFFERENCE;
import static org.tjmargin.units.Dimension.THERMAL_CONDUCTIVITY;
import static org.tjmargin.units.Dimension.THERMAL_RESISTANCE;
import static org.tjmargin.units.Dimension.TIME;
import static org.tjmargin.units.Dimension.VOLTAGE;
import static org.tjmargin.units.Dimension.VOLTAGE_TEMPERATURE_COEFFICIENT;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.tjmargin.units.UnitForm.Prefixes;

/** The units that are read, by normalised spelling, and how a written unit is looked up. */
final class UnitTable {

    /** A unit found in the table, with the prefix written before it (or null). */
    record Resolved(UnitForm form, SiPrefix prefix) {

        /** The dimensions this unit can measure; no prefixed unit is an absolute temperature. */
        List<Dimension> dimensions() {
            if (prefix == null) {
                return form.dimensions();
            }
            List<Dimension> ds = new ArrayList<>(form.dimensions());
            ds.remove(TEMPERATURE);
            return ds;
        }

        /** The unit is 10^scaleExponent() of the SI unit. */
        int scaleExponent() {
            int p = prefix == null ? 0 : prefix.exponent() * form.prefixPower();
            return form.scaleExponent() + p;
        }
    }

    private static final String DEG_C = "\u00B0C";
    private static final String SQ = "\u00B2";
    private static final String DOT = "\u00B7";

    private static final Map<String, UnitForm> FORMS = buildForms();

    private UnitTable() {
    }

    /** Every accepted normalised spelling, in table order (for tests and documentation). */
    static List<UnitForm> forms() {
        return List.copyOf(FORMS.values());
    }

    /**
     * Looks a written unit up.
     *
     * @param text the whole text, for messages
     * @param unit the unit as written (already stripped); empty for a plain number
     * @param expected what the caller accepts, for messages
     */
    static Resolved resolve(String text, String unit, List<Dimension> expected) {
        String norm = UnitSpelling.normalise(unit);
        UnitForm exact = FORMS.get(norm);
        if (exact != null) {
            return new Resolved(exact, null);
        }
        if (UnitSpelling.isAmbiguous(norm)) {
            throw Rejections.ambiguousUnit(text, unit, expected);
        }
        if (norm.length() > 1) {
            Optional<SiPrefix> prefix = SiPrefix.fromSymbol(norm.substring(0, 1));
            UnitForm rest = FORMS.get(norm.substring(1));
            if (prefix.isPresent() && rest != null) {
                if (!rest.prefixes().allows(prefix.get())) {
                    throw Rejections.prefixNotAllowed(text, unit, prefix.get(), rest.spelling(),
                            expected);
                }
                return new Resolved(rest, prefix.get());
            }
        }
        throw Rejections.unknownUnit(text, unit, expected);
    }

    private static Map<String, UnitForm> buildForms() {
        Map<String, UnitForm> m = new LinkedHashMap<>();
        prefixed(m, VOLTAGE, "V");
        prefixed(m, CURRENT, "A");
        prefixed(m, RESISTANCE, "\u03A9");
        prefixed(m, POWER, "W");
        prefixed(m, ENERGY, "J");
        prefixed(m, TIME, "s");
        add(m, new UnitForm("m", List.of(LENGTH), Prefixes.ALL, 1, 0, false));
        add(m, new UnitForm("m" + SQ, List.of(AREA), Prefixes.ALL, 2, 0, false));
        List<Dimension> temperatures = List.of(TEMPERATURE, TEMPERATURE_DIFFERENCE);
        add(m, new UnitForm("K", temperatures, Prefixes.ALL_BUT_CENTI, 1, 0, false));
        add(m, new UnitForm(DEG_C, temperatures, Prefixes.NONE, 1, 0, true));
        for (String k : List.of("K", DEG_C)) {
            plain(m, THERMAL_RESISTANCE, k + "/W", 0);
            prefixed(m, THERMAL_CONDUCTIVITY, "W/(m" + DOT + k + ")");
            prefixed(m, THERMAL_CONDUCTIVITY, "W/m/" + k);
            prefixed(m, THERMAL_CONDUCTIVITY, "W/m" + k);
            prefixed(m, HEAT_TRANSFER_COEFFICIENT, "W/(m" + SQ + DOT + k + ")");
            prefixed(m, HEAT_TRANSFER_COEFFICIENT, "W/m" + SQ + "/" + k);
            prefixed(m, HEAT_TRANSFER_COEFFICIENT, "W/m" + SQ + k);
            prefixed(m, VOLTAGE_TEMPERATURE_COEFFICIENT, "V/" + k);
            plain(m, RELATIVE_TEMPERATURE_COEFFICIENT, "1/" + k, 0);
            plain(m, RELATIVE_TEMPERATURE_COEFFICIENT, "%/" + k, -2);
            plain(m, RELATIVE_TEMPERATURE_COEFFICIENT, "ppm/" + k, -6);
            prefixed(m, POWER_DERATING_SLOPE, "W/" + k);
            prefixed(m, HEAT_CAPACITY, "J/" + k);
        }
        plain(m, RELATIVE_TEMPERATURE_COEFFICIENT, "K\u207B\u00B9", 0);
        plain(m, FRACTION, "", 0);
        plain(m, FRACTION, "%", -2);
        plain(m, FRACTION, "ppm", -6);
        prefixed(m, CHARGE, "C");
        prefixed(m, CHARGE, "A" + DOT + "s");
        plain(m, ACTION_INTEGRAL, "A" + SQ + "s", 0);
        plain(m, ACTION_INTEGRAL, "A" + SQ + DOT + "s", 0);
        prefixed(m, FREQUENCY, "Hz");
        return Collections.unmodifiableMap(m);
    }

    private static void prefixed(Map<String, UnitForm> m, Dimension d, String spelling) {
        add(m, new UnitForm(spelling, List.of(d), Prefixes.ALL_BUT_CENTI, 1, 0, false));
    }

    private static void plain(Map<String, UnitForm> m, Dimension d, String spelling, int scale) {
        add(m, new UnitForm(spelling, List.of(d), Prefixes.NONE, 1, scale, false));
    }

    private static void add(Map<String, UnitForm> m, UnitForm f) {
        if (m.put(f.spelling(), f) != null) {
            throw new IllegalStateException("unit spelled twice: " + f.spelling());
        }
    }
}
