package org.tjmargin.design;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import org.tjmargin.device.RatingReference;
import org.tjmargin.units.Dimension;

/**
 * Reads one entry of the library's {@code resistors} list: the rated power and its derating against the resistor's
 * ambient (film resistors are commonly rated to 70 °C and zero at the upper category temperature, IEC 60115-1).
 */
final class ResistorReader {

    private static final Set<String> KEYS = Set.of("id", "power", "derating");

    private ResistorReader() {
    }

    static Optional<ResistorPart> read(FileContext ctx, Node node, String path) {
        Optional<Fields> of = Fields.of(ctx, node, path, KEYS);
        if (of.isEmpty()) {
            return Optional.empty();
        }
        Fields f = of.get();
        Optional<String> id = f.text("id", Need.REQUIRED);
        Optional<Value> power = f.quantity("power", Need.REQUIRED, Sign.POSITIVE, Dimension.POWER);
        Optional<Fields> derating = f.object("derating", Need.REQUIRED, DeratingReader.SHAPE_KEYS);
        if (!Fields.present(id, power, derating)) {
            return Optional.empty();
        }
        List<String> notes = new ArrayList<>();
        return DeratingReader.read(derating.get(), RatingReference.AMBIENT, 0.0, power.get(), OptionalDouble.empty(),
                notes).flatMap(c -> f.build(() -> new ResistorPart(id.get(), c)));
    }
}
