package org.tjmargin.design;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;

/**
 * A parts library: breakdown diodes and resistor types by identifier, in file order.
 *
 * @param parts     breakdown diodes by id
 * @param resistors resistor types by id
 */
public record PartsLibrary(Map<String, LibraryPart> parts, Map<String, ResistorPart> resistors) {

    public PartsLibrary {
        parts = Collections.unmodifiableMap(new LinkedHashMap<>(parts));
        resistors = Collections.unmodifiableMap(new LinkedHashMap<>(resistors));
    }

    /** The diode with this id. */
    public Optional<LibraryPart> part(String id) {
        return Optional.ofNullable(parts.get(id));
    }

    /** The resistor type with this id. */
    public Optional<ResistorPart> resistor(String id) {
        return Optional.ofNullable(resistors.get(id));
    }
}
