package tetrapod.cli;

import java.io.StringWriter;
import picocli.CommandLine;

/** One run of the command line with its output and error text captured. */
record CliRun(int exitCode, String out, String err) {

    static CliRun of(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        CommandLine cl = Main.commandLine(out, err);
        int code = cl.execute(args);
        return new CliRun(code, out.toString(), err.toString());
    }
}
