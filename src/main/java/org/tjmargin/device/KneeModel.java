package org.tjmargin.device;

/**
 * How the breakdown characteristic bends between the knee current {@code Izk} and the test current {@code Izt}.
 *
 * <ul>
 *   <li>{@link Linear}: the straight line {@code V = Vz0(Tj) + Rz·I} holds down to {@code Izk}, the textbook
 *   piecewise-linear model (A. S. Sedra and K. C. Smith, <i>Microelectronic Circuits</i>, 5th ed., §3.5).</li>
 *   <li>{@link CurrentDependent}: the dynamic impedance grows as the current falls, {@code Zz(I) = a/I + b},
 *   with {@code a}, {@code b} chosen so that {@code Zz(Izt) = Zzt} and {@code Zz(Izk) = Zzk}. Integrated, the
 *   voltage falls logarithmically toward the knee. The {@code 1/I} law is the one of K. Walters, "Zener voltage
 *   regulation with current", application-note series no. 202 ({@code Zz ≈ Zzt·Izt/I}); the constant {@code b}
 *   lets the curve also meet the datasheet's knee impedance.</li>
 * </ul>
 *
 * <p>Why not a straight second segment of slope {@code Zzk} from {@code Izk} to {@code Izt}: {@code Zzk} is the
 * small-signal impedance <em>at</em> the knee. Over the whole interval it would put the knee volts below the
 * breakdown voltage (600 Ω over 4.75 mA is 2.9 V), which no real part shows; the current-dependent form is
 * continuous with the upper line in value and slope and keeps the knee's drop to a fraction of a volt.
 */
public sealed interface KneeModel permits KneeModel.Linear, KneeModel.CurrentDependent {

    /** The straight line down to {@code Izk}. */
    record Linear() implements KneeModel {
    }

    /**
     * {@code Zz(I) = aVolts/I + bOhm} for {@code Izk ≤ I ≤ Izt}.
     *
     * @param aVolts coefficient of {@code 1/I} (V)
     * @param bOhm   constant part (Ω)
     */
    record CurrentDependent(double aVolts, double bOhm) implements KneeModel {

        /**
         * The impedance law through {@code Zzt} at {@code Izt} and {@code Zzk} at {@code Izk}.
         *
         * @throws IllegalArgumentException when {@code Zzk < Zzt} or the currents are not ordered
         */
        public static CurrentDependent through(double zztOhm, double iztA, double zzkOhm, double izkA) {
            if (!(izkA > 0 && izkA < iztA)) {
                throw new IllegalArgumentException("knee current " + izkA + " A must lie between 0 and the test current "
                        + iztA + " A");
            }
            if (!(zzkOhm >= zztOhm)) {
                throw new IllegalArgumentException("knee impedance " + zzkOhm + " Ω is below the test-current impedance "
                        + zztOhm + " Ω; a breakdown diode's impedance grows toward the knee");
            }
            double a = (zzkOhm - zztOhm) / (1.0 / izkA - 1.0 / iztA);
            return new CurrentDependent(a, zztOhm - a / iztA);
        }
    }
}
