package org.tjmargin.design;

import java.util.Objects;
import org.tjmargin.device.BreakdownPart;

/**
 * A breakdown diode of the parts library: the domain part and its package, from which each position's thermal path
 * is composed.
 *
 * @param part the part
 * @param pkg  its package
 */
public record LibraryPart(BreakdownPart part, PackageSpec pkg) {
    public LibraryPart {
        Objects.requireNonNull(part, "part");
        Objects.requireNonNull(pkg, "pkg");
    }
}
