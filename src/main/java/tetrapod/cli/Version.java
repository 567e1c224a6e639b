package tetrapod.cli;

import picocli.CommandLine.IVersionProvider;

/** The version printed by {@code --version}, from the jar manifest when there is one. */
public final class Version implements IVersionProvider {
    @Override
    public String[] getVersion() {
        String v = Main.class.getPackage().getImplementationVersion();
        return new String[] {"tetrapod " + (v == null ? "(development build)" : v)};
    }
}
