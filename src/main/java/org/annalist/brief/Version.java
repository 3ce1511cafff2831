package org.annalist.brief;

/**
 * The software version as the jar's manifest states it (the build writes the project's version
 * there). A release prints as built ({@code 0.2.0}); a Maven development version
 * ({@code 0.2.0-SNAPSHOT}) prints without the qualifier a reader of a brief cannot interpret, as
 * {@code 0.2.0 (development build)}; code run from classes, with no manifest, says only
 * {@code development build}.
 */
public final class Version {

    private static final String SNAPSHOT = "-SNAPSHOT";

    private Version() {
    }

    public static String current() {
        return of(Version.class.getPackage().getImplementationVersion());
    }

    /** The printed form of the manifest's {@code Implementation-Version} (null when there is none). */
    static String of(String implementationVersion) {
        if (implementationVersion == null || implementationVersion.isBlank()) {
            return "development build";
        }
        return implementationVersion.endsWith(SNAPSHOT)
                ? implementationVersion.substring(0, implementationVersion.length() - SNAPSHOT.length()) + " (development build)"
                : implementationVersion;
    }
}
