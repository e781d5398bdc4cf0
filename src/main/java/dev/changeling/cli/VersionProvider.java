package dev.changeling.cli;

import picocli.CommandLine;

/** The version from the jar's manifest, or "development" when run from classes. */
final class VersionProvider implements CommandLine.IVersionProvider {

    @Override
    public String[] getVersion() {
        return new String[] {"changeling " + number()};
    }

    /** The bare version, as tools that read our output want it. */
    static String number() {
        String version = VersionProvider.class.getPackage().getImplementationVersion();
        return version == null ? "development" : version;
    }
}
