package org.tjmargin.device;

/**
 * The point whose temperature a power rating curve is plotted against.
 *
 * <ul>
 *   <li>{@link #LEAD}: the lead at a stated distance from the body (axial parts, e.g. 9.5 mm = 3/8 in);</li>
 *   <li>{@link #AMBIENT}: the air around the part in the datasheet's mounting;</li>
 *   <li>{@link #CASE}: the case or tab (power packages, surface-mount tabs);</li>
 *   <li>{@link #JUNCTION}: the junction itself (the curve is then a plain {@code Tj max}).</li>
 * </ul>
 */
public enum RatingReference {
    LEAD, AMBIENT, CASE, JUNCTION
}
