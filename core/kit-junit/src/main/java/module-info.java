/**
 * The JUnit 5 part of Trundle's property-testing kit: argument sources and assertions
 * ({@code org.trundle.core.check.junit}). JUnit creates the argument providers by reflection, so the
 * package is also open to it.
 */
module org.trundle.kit.junit {
    requires transitive org.trundle.kit;
    requires transitive org.junit.jupiter.api;
    requires transitive org.junit.jupiter.params;

    exports org.trundle.core.check.junit;
    opens org.trundle.core.check.junit to org.junit.platform.commons;
}
