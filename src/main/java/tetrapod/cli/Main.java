package tetrapod.cli;

import java.io.PrintWriter;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import tetrapod.common.BadInputException;
import tetrapod.common.Problem;
import tetrapod.common.UnstableStructureException;

/** The {@code tetrapod} command: the only place that prints or exits. */
@Command(name = "tetrapod", mixinStandardHelpOptions = true, versionProvider = Version.class,
        description = "Analysis and checking of four-leg steel lattice towers.%n"
                + "Results must be checked by a qualified engineer against the codes that apply locally.",
        subcommands = {AnalyzeCommand.class, SizeCommand.class, ValidateCommand.class, NewCommand.class,
                GeometryCommand.class, RenderCommand.class, ViewCommand.class, ReportCommand.class,
                CommandLine.HelpCommand.class})
public final class Main implements Runnable {

    @Option(names = "--debug", scope = CommandLine.ScopeType.INHERIT,
            description = "Print stack traces of internal errors.")
    boolean debug;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    public static void main(String[] args) {
        // charts and pictures are drawn off screen: never ask AWT for a display
        if (System.getProperty("java.awt.headless") == null) {
            System.setProperty("java.awt.headless", "true");
        }
        System.exit(commandLine().execute(args));
    }

    /** The configured command line, for main and for tests (which set their own out and err). */
    public static CommandLine commandLine() {
        CommandLine cl = new CommandLine(new Main());
        cl.setExecutionExceptionHandler(Main::handle);
        cl.setParameterExceptionHandler((ex, args) -> {
            PrintWriter err = ex.getCommandLine().getErr();
            err.println("tetrapod: " + ex.getMessage());
            err.println("Try '" + ex.getCommandLine().getCommandSpec().qualifiedName() + " --help'.");
            return ExitCode.BAD_INPUT;
        });
        return cl;
    }

    private static int handle(Exception ex, CommandLine cl, CommandLine.ParseResult parsed) {
        PrintWriter err = cl.getErr();
        if (ex instanceof BadInputException bad) {
            for (Problem p : bad.problems()) {
                err.println("error: " + p);
            }
            return ExitCode.BAD_INPUT;
        }
        if (ex instanceof UnstableStructureException unstable) {
            err.println("error: " + unstable.getMessage());
            return ExitCode.UNSTABLE;
        }
        err.println("internal error: " + ex);
        boolean debug = parsed.hasMatchedOption("--debug")
                || parsed.subcommands().stream().anyMatch(s -> s.hasMatchedOption("--debug"));
        if (debug) {
            ex.printStackTrace(err);
        } else {
            err.println("(run again with --debug for the stack trace; please report it)");
        }
        return ExitCode.INTERNAL;
    }
}
