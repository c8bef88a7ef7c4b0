package org.tjmargin.device;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The prepared diode, with its temperature-independent constants computed once, against the expressions those
 * constants were hoisted from; then one case against the knee law's closed integral,
 * {@code V(Izk) = V(Izt) − a·ln(Izt/Izk) − b·(Izt − Izk)} for {@code Zz(I) = a/I + b}.
 */
class PreparedDiodeTest {

    /** Random valid diodes: 2.4–100 V, both knee models, with and without leakage (doubling every 5–20 K). */
    private static BreakdownDiode draw(Random rnd) {
        while (true) {
            double vz = 2.4 + 97.6 * rnd.nextDouble();
            double izt = 1e-3 + 0.1 * rnd.nextDouble();
            double izk = izt * (0.01 + 0.3 * rnd.nextDouble());
            double rz = Math.min(0.5 + 99.5 * rnd.nextDouble(), 0.3 * vz / izt);
            KneeModel knee = rnd.nextBoolean() ? new KneeModel.Linear()
                    : KneeModel.CurrentDependent.through(rz, izt, rz * (1 + 20 * rnd.nextDouble()), izk);
            double alpha = (-0.09 + 0.21 * rnd.nextDouble()) / 100 * vz;
            try {
                BreakdownDiode plain = new BreakdownDiode(vz - rz * izt, rz, izt, izk, knee,
                        TemperatureCoefficient.exact(alpha), Leakage.NONE);
                if (rnd.nextBoolean()) {
                    return plain;
                }
                double vzk = plain.kneeVoltageV(Celsius.T25_K);
                return new BreakdownDiode(plain.vz0At25V(), rz, izt, izk, knee, plain.tc(),
                        new Leakage(1e-9 + 1e-4 * rnd.nextDouble(), (0.3 + 0.6 * rnd.nextDouble()) * vzk,
                                5 + 15 * rnd.nextDouble()));
            } catch (IllegalArgumentException e) {
                // a knee that drops more than half the voltage is no breakdown diode: draw again
            }
        }
    }

    /**
     * The constants hoisted out of the per-evaluation path give exactly the unhoisted expressions: the knee voltage
     * is the characteristic at {@code Izk}; the excess-leakage conductance, cheap exit included, is
     * {@code max(0, Ir(Tj) − Izk/2)/Vr(Tj)} with {@code Ir(Tj)} from {@link Leakage#currentAtTestVoltageA} and
     * {@code Vr(Tj) = Vr·Vzk(Tj)/Vzk(25 °C)}; and the reverse current inverts the breakdown voltage on the
     * characteristic (to 1e-12 of the current, the bisection's resolution on the knee, plus the voltage's rounding).
     */
    @Test
    void hoistedConstantsGiveTheUnhoistedExpressions() {
        long seed = 20261202L;
        Random rnd = new Random(seed);
        int withExcessLeakage = 0;
        for (int n = 0; n < 3000; n++) {
            BreakdownDiode d = draw(rnd);
            PreparedDiode p = PreparedDiode.of(d);
            String where = "seed " + seed + " case " + n + ": " + d;
            double vzk25 = p.breakdownVoltageV(d.izkA(), Celsius.T25_K);
            for (int k = 0; k < 8; k++) {
                // −55 °C to 400 °C: from cold through the range where the excess leakage takes over.
                double tj = Celsius.toKelvin(-55 + 455 * rnd.nextDouble());
                double i = d.izkA() + (2 * d.iztA() - d.izkA()) * rnd.nextDouble();
                assertEquals(p.breakdownVoltageV(d.izkA(), tj), p.kneeVoltageV(tj), where);
                double expectedG = 0.0;
                if (d.leakage().isKnown()) {
                    double excess = d.leakage().currentAtTestVoltageA(tj) - 0.5 * d.izkA();
                    double vrT = d.leakage().vrV() * p.kneeVoltageV(tj) / vzk25;
                    expectedG = excess > 0 ? excess / vrT : 0.0;
                }
                double g = p.excessLeakageConductanceS(tj);
                assertEquals(expectedG, g, Math.ulp(expectedG) * 4, where);
                double v = p.breakdownVoltageV(i, tj);
                // The voltage carries a few ulps of its own size (tens of volts), which the inversion divides by the
                // slope of the characteristic there.
                double tolerance = 1e-12 * i + 4 * Math.ulp(v) / p.dynamicImpedanceOhm(i) + 4 * Math.ulp(g * v);
                assertEquals(i + g * v, p.reverseCurrentA(v, tj), tolerance, where);
                if (g > 0) {
                    withExcessLeakage++;
                }
            }
        }
        assertTrue(withExcessLeakage > 100, "the draw reaches the excess-leakage branch: " + withExcessLeakage);
    }

    @Test
    void kneeVoltageIsTheIntegralOfTheKneeImpedance() {
        // Zz(I) = a/I + b through Zzt = 10 Ω at 20 mA and Zzk = 400 Ω at 1 mA (invented numbers): the drop from
        // the line at Izt to Izk is ∫ (a/x + b) dx = a·ln(Izt/Izk) + b·(Izt − Izk), for any temperature.
        KneeModel.CurrentDependent k = KneeModel.CurrentDependent.through(10, 20e-3, 400, 1e-3);
        double a = (400 - 10) / (1 / 1e-3 - 1 / 20e-3);
        double b = 10 - a / 20e-3;
        BreakdownDiode d = new BreakdownDiode(11.8, 10, 20e-3, 1e-3, k, TemperatureCoefficient.exact(8e-3),
                Leakage.NONE);
        double tj = Celsius.toKelvin(85);
        double lineAtIzt = 11.8 + 8e-3 * 60 + 10 * 20e-3;
        // 1e-12 V: a few ulps of 12 V; the closed form and the model add the same terms in another order.
        assertEquals(lineAtIzt - a * Math.log(20) - b * 19e-3, PreparedDiode.of(d).kneeVoltageV(tj), 1e-12);
    }
}
