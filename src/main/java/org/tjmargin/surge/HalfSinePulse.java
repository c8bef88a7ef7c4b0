package org.tjmargin.surge;

import java.util.List;

/**
 * A half-sine pulse {@code amplitude·sin(π·t/width)} for {@code 0 ≤ t ≤ width} (forward and Zener surge ratings,
 * reference 4.5: one 8.3 ms half sine, half a 60 Hz cycle, the "JEDEC method"; 10 ms for 50 Hz). Integrals
 * (derived): {@code ∫ i dt = (2/π)·Ip·width}, {@code ∫ i² dt = Ip²·width/2}.
 *
 * @param amplitude peak (A or V), positive
 * @param widthS    base width (s), positive
 * @param quantity  current or voltage
 */
public record HalfSinePulse(double amplitude, double widthS, SurgeQuantity quantity) implements Waveform {

    /** 8.3 ms: half a 60 Hz cycle as the rating convention rounds it (1/120 s = 8.333 ms; reference 4.5). */
    public static final double SIXTY_HERTZ_WIDTH_S = 8.3e-3;
    /** 10 ms: half a 50 Hz cycle (reference 4.5). */
    public static final double FIFTY_HERTZ_WIDTH_S = 10e-3;

    public HalfSinePulse {
        if (!(amplitude > 0) || !Double.isFinite(amplitude)) {
            throw new IllegalArgumentException("half-sine amplitude must be positive and finite: " + amplitude);
        }
        if (!(widthS > 0) || !Double.isFinite(widthS)) {
            throw new IllegalArgumentException("half-sine width must be positive and finite: widthS = " + widthS);
        }
        if (quantity == null) {
            throw new IllegalArgumentException("half-sine pulse needs a quantity");
        }
    }

    /** @return an 8.3 ms half-sine current of peak {@code peakA} (A) */
    public static HalfSinePulse sixtyHertzCurrent(double peakA) {
        return new HalfSinePulse(peakA, SIXTY_HERTZ_WIDTH_S, SurgeQuantity.CURRENT);
    }

    /** @return a 10 ms half-sine current of peak {@code peakA} (A) */
    public static HalfSinePulse fiftyHertzCurrent(double peakA) {
        return new HalfSinePulse(peakA, FIFTY_HERTZ_WIDTH_S, SurgeQuantity.CURRENT);
    }

    @Override
    public double valueAt(double tS) {
        return tS >= 0 && tS <= widthS ? amplitude * Math.sin(Math.PI * tS / widthS) : 0;
    }

    @Override
    public double[] breakpointsS() {
        return new double[] {0, widthS / 2, widthS};
    }

    @Override
    public List<Front> fronts() {
        return List.of(new Front(0, widthS / 2));
    }

    @Override
    public double durationS() {
        return widthS;
    }
}
