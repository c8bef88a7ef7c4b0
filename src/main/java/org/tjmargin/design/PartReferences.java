package org.tjmargin.design;

import java.util.Optional;

/**
 * Resolves the design's references into the parts library, reporting unknown ones. When the library itself could
 * not be read, or the referenced entry was declared but failed its own checks, nothing more is reported: the
 * library's problems already say why.
 *
 * @param library what the library file declared and mapped, or empty when it could not be read
 */
record PartReferences(Optional<PartsReader.Result> library) {

    /** The diode named at {@code key} of {@code f}. */
    Optional<LibraryPart> part(Fields f, String key) {
        Optional<String> id = f.text(key, Need.REQUIRED);
        if (id.isEmpty() || library.isEmpty()) {
            return Optional.empty();
        }
        PartsReader.Result lib = library.get();
        Optional<LibraryPart> p = lib.library().part(id.get());
        if (p.isEmpty() && !lib.partIds().contains(id.get())) {
            String hint = lib.resistorIds().contains(id.get()) ? " ('" + id.get() + "' is a resistor)" : "";
            f.report(InputProblem.Kind.UNKNOWN_REFERENCE, key, "no part '" + id.get()
                    + "' in the parts library" + hint);
        }
        return p;
    }

    /** The resistor type named at {@code key} of {@code f}. */
    Optional<ResistorPart> resistor(Fields f, String key) {
        Optional<String> id = f.text(key, Need.REQUIRED);
        if (id.isEmpty() || library.isEmpty()) {
            return Optional.empty();
        }
        PartsReader.Result lib = library.get();
        Optional<ResistorPart> r = lib.library().resistor(id.get());
        if (r.isEmpty() && !lib.resistorIds().contains(id.get())) {
            String hint = lib.partIds().contains(id.get()) ? " ('" + id.get() + "' is a diode)" : "";
            f.report(InputProblem.Kind.UNKNOWN_REFERENCE, key, "no resistor '" + id.get()
                    + "' in the parts library" + hint);
        }
        return r;
    }

    /** True when the library was read, so that a missing part means the position cannot be mapped. */
    boolean known() {
        return library.isPresent();
    }
}
