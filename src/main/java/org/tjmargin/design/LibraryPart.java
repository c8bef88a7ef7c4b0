package org.tjmargin.design;

import java.util.Objects;
import java.util.Optional;
import org.tjmargin.device.BreakdownPart;

/**
 * A breakdown diode of the parts library: the domain part and its package, from which each position's thermal path
 * is composed.
 *
 * @param part the part
 * @param pkg  its package
 * @param surge its surge data, if the library gives any
 */
public record LibraryPart(BreakdownPart part, PackageSpec pkg, Optional<SurgePartSpec> surge) {

    /** A part without surge data. */
    public LibraryPart(BreakdownPart part, PackageSpec pkg) {
        this(part, pkg, Optional.empty());
    }

    public LibraryPart {
        surge = surge == null ? Optional.empty() : surge;
        Objects.requireNonNull(part, "part");
        Objects.requireNonNull(pkg, "pkg");
    }
}
