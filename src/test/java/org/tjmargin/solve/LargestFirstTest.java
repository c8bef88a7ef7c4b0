package org.tjmargin.solve;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;

import java.util.Arrays;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The heat floor's top-k selection against the definition it replaces: the first {@code k} indices of the JDK's stable
 * sort ({@code Arrays.sort} on boxed indices, {@code Double.compare} descending), on seeded random arrays with many
 * ties, zeros and signed zeros.
 */
class LargestFirstTest {

    @Test
    void theFirstKOfAStableDescendingSort() {
        Random rnd = new Random(20_261_202L);
        for (int trial = 0; trial < 3000; trial++) {
            int n = rnd.nextInt(40);
            double[] v = new double[n];
            for (int i = 0; i < n; i++) {
                int kind = rnd.nextInt(5);
                v[i] = kind == 0 ? 0.0 : kind == 1 ? -0.0 : kind == 2 ? rnd.nextInt(4) * 0.25 : rnd.nextDouble();
            }
            Integer[] order = new Integer[n];
            for (int i = 0; i < n; i++) {
                order[i] = i;
            }
            Arrays.sort(order, (a, b) -> Double.compare(v[b], v[a]));
            for (int k : new int[] {0, 1, 3, AirMap.FLOOR_TERMS, 50}) {
                int[] expected = Arrays.stream(order).limit(k).mapToInt(Integer::intValue).toArray();
                assertArrayEquals(expected, AirMap.HeatFloor.largestFirst(v, k), Arrays.toString(v) + " k " + k);
            }
        }
    }
}
