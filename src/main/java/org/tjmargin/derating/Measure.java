package org.tjmargin.derating;

/**
 * A quantity a rule can limit, with the unit its values carry (SI; temperatures in kelvin).
 * A quantity is present in a {@link RuleContext} only where it applies (no knee-current ratio for a clamp).
 */
public enum Measure {
    /** Junction temperature (K). */
    JUNCTION_TEMPERATURE("junction temperature", "K", true),
    /** Diode power over the device rating read at the rating's reference temperature (1). */
    POWER_RATIO("power / derated rating", "1", false),
    /** Zener current over the knee current {@code Izk} (1). */
    KNEE_CURRENT_RATIO("Zener current / Izk", "1", false),
    /** Zener current over the maximum Zener current {@code Izm} (1). */
    MAX_CURRENT_RATIO("Zener current / Izm", "1", false),
    /** Series-resistor power over its derated rating at its ambient (1). */
    RESISTOR_POWER_RATIO("resistor power / derated rating", "1", false),
    /** Line voltage over the clamp's working standoff voltage {@code Vwm} (1). */
    STANDOFF_RATIO("line voltage / standoff voltage", "1", false),
    /** Highest junction temperature during a position's surges, started from the steady state (K). */
    SURGE_JUNCTION_TEMPERATURE("surge peak junction temperature", "K", true),
    /**
     * Largest ratio over a position's surges of the clamp's peak pulse power to its pulse rating converted to the
     * applied pulse and derated to the start temperature (1).
     */
    SURGE_POWER_RATIO("surge peak power / derated pulse rating", "1", false),
    /** Largest ratio over a position's surges of the peak clamp voltage to the protected input's limit (1). */
    CLAMP_VOLTAGE_RATIO("surge clamp voltage / protected input limit", "1", false);

    private final String description;
    private final String unit;
    private final boolean temperature;

    Measure(String description, String unit, boolean temperature) {
        this.description = description;
        this.unit = unit;
        this.temperature = temperature;
    }

    /** The key used in profile files, e.g. {@code junction-temperature}. */
    public String key() {
        return name().toLowerCase(java.util.Locale.ROOT).replace('_', '-');
    }

    /** The measure with profile key {@code key}, if any. */
    public static java.util.Optional<Measure> fromKey(String key) {
        for (Measure m : values()) {
            if (m.key().equals(key)) {
                return java.util.Optional.of(m);
            }
        }
        return java.util.Optional.empty();
    }

    /** Human description. */
    public String description() {
        return description;
    }

    /** SI unit of the values ({@code 1} for ratios). */
    public String unit() {
        return unit;
    }

    /** True for the quantities of surges (design 2.6). */
    public boolean isSurge() {
        return this == SURGE_JUNCTION_TEMPERATURE || this == SURGE_POWER_RATIO || this == CLAMP_VOLTAGE_RATIO;
    }

    /** True for temperatures, whose margins are taken on the rise above 25 °C. */
    public boolean isTemperature() {
        return temperature;
    }
}
