package org.trundle.core;

/**
 * One natural coordinate of a surface (see {@link Surface#coordinates()}): a snake_case name of our
 * own (a column name), its unit ({@code "m"} or {@code "rad"}) and a one-line meaning.
 *
 * @param name snake_case name, for instance {@code "axial"} or {@code "azimuth"}
 * @param unit unit, {@code "m"} or {@code "rad"}
 * @param meaning what the coordinate measures, from where and which way it runs
 */
public record SurfaceCoordinate(String name, String unit, String meaning) {
    /**
     * Checks the fields.
     *
     * @param name snake_case name
     * @param unit unit
     * @param meaning what it measures
     */
    public SurfaceCoordinate {
        if (name == null || !name.matches("[a-z][a-z0-9_]*")) {
            throw new IllegalArgumentException("coordinate name must be snake_case, got " + name);
        }
        if (unit == null || unit.isEmpty() || meaning == null) {
            throw new IllegalArgumentException("coordinate " + name + " needs a unit and a meaning, got unit = "
                + unit + ", meaning = " + meaning);
        }
    }
}
