package org.tjmargin.surge;

/**
 * An independent measurement of a sampled pulse's front time and time to half value, written from the definitions
 * of reference 4.1 (JEDEC JESD77/JESD210; IEC 60060-1): dense uniform sampling, the peak from a parabola through
 * the three highest samples, crossings by linear interpolation between samples, the virtual origin where the line
 * through the low and 90 % points crosses zero. It shares no code with the production timing solve.
 */
final class SampledTiming {

    /** Measured timing. */
    record Timing(double frontTimeS, double timeToHalfS, double peak, double peakTimeS) {
    }

    private SampledTiming() {
    }

    /**
     * @param w        waveform
     * @param spanS    sampled span from 0 (s), covering the 50 % point of the tail
     * @param samples  number of intervals
     * @param current  true for the current definition (10 %, 90 %, ×1.25), false for voltage (30 %, 90 %, ×1.67)
     */
    static Timing measure(Waveform w, double spanS, int samples, boolean current) {
        double low = current ? 0.1 : 0.3;
        double factor = current ? 1.25 : 1.67;
        double dt = spanS / samples;
        double[] v = new double[samples + 1];
        int kp = 0;
        for (int k = 0; k <= samples; k++) {
            v[k] = w.valueAt(k * dt);
            if (v[k] > v[kp]) {
                kp = k;
            }
        }
        double a = v[kp - 1];
        double b = v[kp];
        double c = v[kp + 1];
        double offset = 0.5 * (a - c) / (a - 2 * b + c);
        double peak = b - 0.25 * (a - c) * offset;
        double tLow = rising(v, dt, low * peak);
        double t90 = rising(v, dt, 0.9 * peak);
        double t50 = Double.NaN;
        for (int k = kp + 1; k <= samples; k++) {
            if (v[k] <= 0.5 * peak) {
                t50 = (k - 1 + (v[k - 1] - 0.5 * peak) / (v[k - 1] - v[k])) * dt;
                break;
            }
        }
        double origin = tLow - low * (t90 - tLow) / (0.9 - low);
        return new Timing(factor * (t90 - tLow), t50 - origin, peak, (kp + offset) * dt);
    }

    private static double rising(double[] v, double dt, double level) {
        for (int k = 1; k < v.length; k++) {
            if (v[k] >= level) {
                return (k - 1 + (level - v[k - 1]) / (v[k] - v[k - 1])) * dt;
            }
        }
        return Double.NaN;
    }
}
