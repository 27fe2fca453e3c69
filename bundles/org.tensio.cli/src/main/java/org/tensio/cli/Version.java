package org.tensio.cli;

import picocli.CommandLine.IVersionProvider;

/** Version from the jar manifest (the bundle version), or "development" when run from classes. */
final class Version implements IVersionProvider {

    static String engineVersion() {
        String v = Version.class.getPackage().getImplementationVersion();
        if (v == null) {
            try (var in = Version.class.getResourceAsStream("/META-INF/MANIFEST.MF")) {
                if (in != null) {
                    v = new java.util.jar.Manifest(in).getMainAttributes().getValue("Bundle-Version");
                }
            } catch (java.io.IOException e) {
                v = null;
            }
        }
        return v == null ? "development" : v;
    }

    @Override
    public String[] getVersion() {
        return new String[] {"tensio " + engineVersion()};
    }
}
