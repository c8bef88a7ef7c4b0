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
    STANDOFF_RATIO("line voltage / standoff voltage", "1", false);

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

    /** True for temperatures, whose margins are taken on the rise above 25 °C. */
    public boolean isTemperature() {
        return temperature;
    }
}
