package org.tjmargin.thermal;

/**
 * The one validation of the points a Foster fit is given (datasheet Zth curves and pulse-rating curves alike):
 * abscissae positive, finite and strictly increasing, ordinates positive and finite, at least two points per stage
 * so that each stage's resistance and time constant are determined.
 */
final class FitPoints {

    private FitPoints() {
    }

    /**
     * Checks fit points, naming them in messages as e.g. {@code "Zth point 3: time must …"}.
     *
     * @param what   name of a point, e.g. {@code Zth point}
     * @param xName  name of the abscissa, e.g. {@code time}
     * @param x      abscissae (s)
     * @param yName  name of the ordinate, e.g. {@code impedance}
     * @param yUnit  unit of the ordinate, for messages
     * @param y      ordinates
     * @param stages stages to fit
     */
    static void check(String what, String xName, double[] x, String yName, String yUnit, double[] y, int stages) {
        if (stages < 1) {
            throw new IllegalArgumentException("a Foster fit needs at least one stage: " + stages);
        }
        if (x.length != y.length) {
            throw new IllegalArgumentException(what + "s: " + x.length + " " + xName + "s but " + y.length + " "
                    + yName + "s");
        }
        if (x.length < 2 * stages) {
            throw new IllegalArgumentException("a " + stages + "-stage Foster fit needs at least " + 2 * stages
                    + " points, has " + x.length);
        }
        for (int j = 0; j < x.length; j++) {
            if (!(x[j] > 0) || !Double.isFinite(x[j])) {
                throw new IllegalArgumentException(what + " " + j + ": " + xName + " must be positive and finite: "
                        + x[j] + " s");
            }
            if (j > 0 && !(x[j] > x[j - 1])) {
                throw new IllegalArgumentException(what + " " + j + ": " + xName + "s must increase: " + x[j - 1]
                        + " s then " + x[j] + " s");
            }
            if (!(y[j] > 0) || !Double.isFinite(y[j])) {
                throw new IllegalArgumentException(what + " " + j + ": " + yName + " must be positive and finite: "
                        + y[j] + " " + yUnit);
            }
        }
    }
}
