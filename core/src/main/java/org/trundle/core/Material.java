package org.trundle.core;

import org.trundle.core.internal.Checks;

/**
 * An isotropic linear-elastic material: Young's modulus {@code E} (Pa) and Poisson's ratio
 * {@code ν} (dimensionless), as a ball or a wall carries it for the Hertz contact solution.
 *
 * <p>Derived moduli (standard isotropic elasticity, any text on elasticity):
 * <pre>
 *   G = E / (2 (1 + ν))                                   shear modulus (Pa)
 *   1/E* = (1 − ν₁²)/E₁ + (1 − ν₂²)/E₂                    contact modulus of a pair (Pa)
 * </pre>
 * (K. L. Johnson, Contact Mechanics, Cambridge University Press 1985, §4.2 for {@code E*}).
 *
 * <p>The named constants are typical room-temperature values, common practice (handbook ranges,
 * quoted from memory): a real part's grade, temper and temperature move them by several percent,
 * and polymers by much more; measure or look up your own pair where the numbers matter.
 *
 * <p>Immutable and thread-safe.
 *
 * @param youngsModulus Young's modulus E (Pa), finite and positive
 * @param poissonRatio Poisson's ratio ν, in [0, 0.5]
 */
public record Material(double youngsModulus, double poissonRatio) {
    /** Bearing or tool steel: E = 210 GPa, ν = 0.30 (common practice). */
    public static final Material STEEL = new Material(210e9, 0.30);
    /** Austenitic stainless steel: E = 193 GPa, ν = 0.29 (common practice). */
    public static final Material STAINLESS_STEEL = new Material(193e9, 0.29);
    /** Silicon nitride ceramic (bearing balls): E = 310 GPa, ν = 0.27 (common practice). */
    public static final Material SILICON_NITRIDE = new Material(310e9, 0.27);
    /** Aluminium alloy: E = 70 GPa, ν = 0.33 (common practice). */
    public static final Material ALUMINIUM = new Material(70e9, 0.33);
    /** Brass: E = 100 GPa, ν = 0.34 (common practice). */
    public static final Material BRASS = new Material(100e9, 0.34);
    /** Soda-lime glass: E = 70 GPa, ν = 0.22 (common practice). */
    public static final Material GLASS = new Material(70e9, 0.22);
    /** Acrylic (PMMA): E = 3.0 GPa, ν = 0.37 (common practice). */
    public static final Material ACRYLIC = new Material(3.0e9, 0.37);
    /** Polycarbonate: E = 2.4 GPa, ν = 0.37 (common practice). */
    public static final Material POLYCARBONATE = new Material(2.4e9, 0.37);
    /** Polyamide 66 (nylon), dry: E = 3.0 GPa, ν = 0.39 (common practice). */
    public static final Material NYLON = new Material(3.0e9, 0.39);

    /**
     * Checks the constants.
     *
     * @throws IllegalArgumentException naming the parameter and value when out of range
     */
    public Material {
        Checks.positive("Young's modulus", youngsModulus);
        if (!(poissonRatio >= 0 && poissonRatio <= 0.5)) {
            throw new IllegalArgumentException("Poisson's ratio must lie in [0, 0.5], got " + poissonRatio);
        }
    }

    /**
     * A material from its constants.
     *
     * @param youngsModulus Young's modulus E (Pa)
     * @param poissonRatio Poisson's ratio ν, in [0, 0.5]
     * @return the material
     */
    public static Material of(double youngsModulus, double poissonRatio) {
        return new Material(youngsModulus, poissonRatio);
    }

    /** @return shear modulus {@code G = E / (2(1 + ν))} (Pa) */
    public double shearModulus() {
        return youngsModulus / (2 * (1 + poissonRatio));
    }

    /** @return plane-strain compliance {@code (1 − ν²)/E} (1/Pa), this body's share of {@code 1/E*} */
    public double planeStrainCompliance() {
        return (1 - poissonRatio * poissonRatio) / youngsModulus;
    }

    /**
     * Contact modulus of this material against another, {@code 1/E* = (1 − ν₁²)/E₁ + (1 − ν₂²)/E₂}
     * (Johnson 1985, §4.2).
     *
     * @param other the other body's material
     * @return E* (Pa)
     */
    public double contactModulus(Material other) {
        if (other == null) {
            throw new IllegalArgumentException("other material must be given, got null");
        }
        return 1.0 / (planeStrainCompliance() + other.planeStrainCompliance());
    }

    /**
     * Combined shear modulus of a pair for rolling-contact creep, {@code 2/G = 1/G₁ + 1/G₂}
     * (J. J. Kalker, Three-Dimensional Elastic Bodies in Rolling Contact, Kluwer 1990, ch. 1; from
     * memory).
     *
     * @param other the other body's material
     * @return G (Pa)
     */
    public double combinedShearModulus(Material other) {
        if (other == null) {
            throw new IllegalArgumentException("other material must be given, got null");
        }
        return 2.0 / (1.0 / shearModulus() + 1.0 / other.shearModulus());
    }

    @Override
    public String toString() {
        return "Material[E=" + youngsModulus + " Pa, nu=" + poissonRatio + "]";
    }
}
