package org.tjmargin.thermal;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import org.apache.commons.math3.linear.EigenDecomposition;
import org.apache.commons.math3.linear.RealMatrix;

/**
 * Cauer ladder of transient thermal impedance: power enters node 1 (the junction); node {@code i} has capacitance
 * {@code C_i} to the reference (ambient) and resistance {@code R_i} to node {@code i+1}; the last resistance goes
 * to the reference. Unlike a Foster network its nodes can be read as physical layers (reference 3.1; JESD51-14
 * structure functions; common practice).
 *
 * <h2>Exact conversion to Foster</h2>
 * The node temperatures obey {@code C·dT/dt = −G·T + e₁·P} with {@code C = diag(C_i)} and the tridiagonal
 * conductance matrix {@code G}. With {@code y = C^½·T} this is {@code dy/dt = −S·y + C^−½·e₁·P}, where
 * {@code S = C^−½·G·C^−½} is symmetric positive definite and tridiagonal; write {@code S = Q·Λ·Qᵀ}. The junction
 * step response is then
 * <pre>
 *   T₁(t)/P = Σ_k (q₁ₖ² / (C₁·λ_k))·(1 − e^(−λ_k·t))
 * </pre>
 * i.e. a Foster network with {@code R_k = q₁ₖ²/(C₁·λ_k)}, {@code τ_k = 1/λ_k} (derived here; the same result
 * as the partial-fraction expansion of the ladder's impedance). Since {@code Σ R_k = (G⁻¹)₁₁ = Σ R_i}, the steady
 * state is preserved. The symmetric tridiagonal eigenproblem is solved by Commons Math
 * ({@link EigenDecomposition#EigenDecomposition(double[], double[])}), accurate to a few ulps of
 * {@code ‖S‖}: stages whose eigenvalue is far below {@code ‖S‖·1e-6} lose relative accuracy in proportion.
 *
 * @param rKPerW series resistances (K/W), positive, finite
 * @param cJPerK shunt capacitances (J/K), positive, finite, same length
 */
public record CauerLadder(double[] rKPerW, double[] cJPerK) implements TransientThermalImpedance {

    public CauerLadder {
        if (rKPerW.length != cJPerK.length || rKPerW.length == 0) {
            throw new IllegalArgumentException("Cauer ladder needs as many resistances as capacitances, at least one: "
                    + rKPerW.length + " resistances, " + cJPerK.length + " capacitances");
        }
        rKPerW = rKPerW.clone();
        cJPerK = cJPerK.clone();
        for (int i = 0; i < rKPerW.length; i++) {
            if (!(rKPerW[i] > 0) || !Double.isFinite(rKPerW[i])) {
                throw new IllegalArgumentException("Cauer resistance " + i + " must be positive and finite: " + rKPerW[i] + " K/W");
            }
            if (!(cJPerK[i] > 0) || !Double.isFinite(cJPerK[i])) {
                throw new IllegalArgumentException("Cauer capacitance " + i + " must be positive and finite: " + cJPerK[i] + " J/K");
            }
        }
    }

    @Override
    public double[] rKPerW() {
        return rKPerW.clone();
    }

    @Override
    public double[] cJPerK() {
        return cJPerK.clone();
    }

    /** @return the number of rungs */
    public int stageCount() {
        return rKPerW.length;
    }

    /** @return {@code Σ R_i} (K/W) */
    @Override
    public double steadyStateKPerW() {
        double r = 0;
        for (double v : rKPerW) {
            r += v;
        }
        return r;
    }

    /** The junction step response, through the exact Foster equivalent. */
    @Override
    public double zthKPerW(double tS) {
        return toFoster().zthKPerW(tS);
    }

    /**
     * The driving-point impedance at a real Laplace variable {@code s ≥ 0} (K/W), by the continued fraction
     * {@code Z = 1/(s·C₁ + 1/(R₁ + 1/(s·C₂ + …)))}: an independent check of {@link #toFoster()}, whose
     * {@code Σ R_k/(1 + s·τ_k)} must agree.
     *
     * @param sPerS Laplace variable (1/s), not negative
     */
    public double impedanceKPerW(double sPerS) {
        if (!(sPerS >= 0) || !Double.isFinite(sPerS)) {
            throw new IllegalArgumentException("Laplace variable must be finite and not negative: " + sPerS);
        }
        int n = rKPerW.length;
        double z = 0; // impedance seen looking right of node n's resistance: the reference
        for (int i = n - 1; i >= 0; i--) {
            double behind = rKPerW[i] + z;
            z = 1 / (sPerS * cJPerK[i] + 1 / behind);
        }
        return z;
    }

    /** @return the exact Foster equivalent (see class comment), stages ordered by increasing time constant */
    public FosterNetwork toFoster() {
        int n = rKPerW.length;
        double[] main = new double[n];
        double[] secondary = new double[Math.max(n - 1, 0)];
        for (int i = 0; i < n; i++) {
            double g = 1 / rKPerW[i];
            if (i > 0) {
                g += 1 / rKPerW[i - 1];
            }
            main[i] = g / cJPerK[i];
            if (i < n - 1) {
                secondary[i] = -(1 / rKPerW[i]) / Math.sqrt(cJPerK[i] * cJPerK[i + 1]);
            }
        }
        EigenDecomposition eigen = new EigenDecomposition(main, secondary);
        double[] lambda = eigen.getRealEigenvalues();
        RealMatrix v = eigen.getV();
        List<FosterStage> stages = new ArrayList<>(n);
        for (int k = 0; k < n; k++) {
            double q1 = v.getEntry(0, k);
            stages.add(new FosterStage(q1 * q1 / (cJPerK[0] * lambda[k]), 1 / lambda[k]));
        }
        return new FosterNetwork(stages).sortedByTimeConstant();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof CauerLadder other && Arrays.equals(rKPerW, other.rKPerW) && Arrays.equals(cJPerK, other.cJPerK);
    }

    @Override
    public int hashCode() {
        return 31 * Arrays.hashCode(rKPerW) + Arrays.hashCode(cJPerK);
    }

    @Override
    public String toString() {
        return "CauerLadder[R = " + Arrays.toString(rKPerW) + " K/W, C = " + Arrays.toString(cJPerK) + " J/K]";
    }
}
