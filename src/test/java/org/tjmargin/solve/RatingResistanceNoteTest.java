package org.tjmargin.solve;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.tjmargin.circuit.CurrentFedSpec;
import org.tjmargin.device.BreakdownDiode;
import org.tjmargin.device.BreakdownPart;
import org.tjmargin.device.Celsius;
import org.tjmargin.device.DiodeRatings;
import org.tjmargin.device.KneeModel;
import org.tjmargin.device.Leakage;
import org.tjmargin.device.PowerRatingCurve;
import org.tjmargin.device.RatingReference;
import org.tjmargin.device.TemperatureCoefficient;
import org.tjmargin.thermal.GivenPath;
import org.tjmargin.variation.Range;

/** The rating curve's implied resistance is held against the thermal data (1 W axial: 150 K/W, reference 2.6). */
class RatingResistanceNoteTest {

    private static PositionSpec withJunctionToLead(double rjlKPerW) {
        PowerRatingCurve c = PowerRatingCurve.flatThenLinear(RatingReference.LEAD, 9.5e-3, 1.0, Celsius.toKelvin(50),
                Celsius.toKelvin(200));
        BreakdownDiode d = new BreakdownDiode(10, 5, 20e-3, 1e-3, new KneeModel.Linear(),
                TemperatureCoefficient.exact(0), Leakage.NONE);
        BreakdownPart part = new BreakdownPart("invented-test-part", BreakdownPart.Kind.ZENER, 10.1, 0.05, d,
                new DiodeRatings(Celsius.toKelvin(200), c, 0.1), 0, List.of());
        return new PositionSpec("D", part, new GivenPath(250, rjlKPerW, List.of()),
                new CurrentFedSpec(Range.exact(20e-3)), Range.exact(0), Range.exact(1), Range.exact(0), List.of());
    }

    @Test
    void agreeingDataGiveNoNote() {
        assertTrue(withJunctionToLead(155).ratingResistanceNote().isEmpty());
    }

    @Test
    void disagreeingDataAreFlagged() {
        assertTrue(withJunctionToLead(100).ratingResistanceNote().orElseThrow().contains("150.0 K/W"));
        assertTrue(withJunctionToLead(100).allNotes().stream().anyMatch(n -> n.contains("disagree")));
    }
}
