package org.annalist.brief;

/** The software version, as the jar's manifest states it ({@code dev} when run from classes). */
public final class Version {

    private Version() {
    }

    public static String current() {
        String version = Version.class.getPackage().getImplementationVersion();
        return version == null ? "dev" : version;
    }
}
