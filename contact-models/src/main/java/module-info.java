/**
 * Trundle's contact laws: pure rolling, Coulomb, rolling and pivoting resistance, the Hertz contact
 * patch and wall loads ({@code org.trundle.contact}).
 */
module org.trundle.contact {
    requires transitive org.trundle.core;

    exports org.trundle.contact;
}
