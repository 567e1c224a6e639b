package tetrapod.cli;

import java.io.PrintWriter;
import java.io.Writer;
import java.nio.charset.Charset;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** The {@code tetrapod} command: the only place that prints or exits. */
@Command(name = "tetrapod", mixinStandardHelpOptions = true, versionProvider = Version.class,
        description = "Analysis and checking of four-leg steel lattice towers.%n"
                + "Results must be checked by a qualified engineer against the codes that apply locally.",
        footer = "%n" + ExitCode.HELP,
        subcommands = {AnalyzeCommand.class, BatchCommand.class, SizeCommand.class, ValidateCommand.class, NewCommand.class,
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
        PrintWriter out = new PrintWriter(System.out, true, Charset.defaultCharset());
        PrintWriter err = new PrintWriter(System.err, true, Charset.defaultCharset());
        boolean debug = java.util.Arrays.asList(args).contains("--debug");
        Thread.setDefaultUncaughtExceptionHandler((thread, e) -> Failures.report(e, SafePrintWriter.around(err), debug));
        int code;
        try {
            code = commandLine(out, err).execute(args);
        } catch (Throwable e) { // the last line: even an error while parsing the arguments gets its code and one line
            code = Failures.report(e, SafePrintWriter.around(err), debug);
        }
        out.flush();
        err.flush();
        System.exit(code);
    }

    /**
     * The configured command line writing to {@code out} and {@code err} through the escaping
     * {@link SafePrintWriter}, for main and for tests.
     */
    public static CommandLine commandLine(Writer out, Writer err) {
        SafePrintWriter safeOut = SafePrintWriter.around(out);
        SafePrintWriter safeErr = SafePrintWriter.around(err);
        CommandLine cl = new CommandLine(new Main());
        cl.setOut(safeOut);
        cl.setErr(safeErr);
        cl.setExecutionExceptionHandler((ex, commandLine, parsed) -> Failures.report(ex, safeErr, debug(parsed)));
        cl.setExecutionStrategy(parsed -> execute(cl, parsed, safeOut, safeErr));
        cl.setParameterExceptionHandler((ex, args) -> {
            PrintWriter w = ex.getCommandLine().getErr();
            w.println("tetrapod: " + ex.getMessage());
            w.println("Try '" + ex.getCommandLine().getCommandSpec().qualifiedName() + " --help'.");
            return ExitCode.BAD_INPUT;
        });
        return cl;
    }

    /** Runs the command; errors of the JVM (which picocli lets through) take the same exit path. */
    private static int execute(CommandLine cl, CommandLine.ParseResult parsed, SafePrintWriter safeOut,
                               SafePrintWriter safeErr) {
        try {
            if (!asksForHelp(parsed)) {
                return new CommandLine.RunLast().execute(parsed);
            }
            // the help pages are the program's own multi-line text: written as they are
            cl.setOut(safeOut.raw());
            try {
                return new CommandLine.RunLast().execute(parsed);
            } finally {
                cl.setOut(safeOut);
            }
        } catch (CommandLine.ExecutionException | CommandLine.ParameterException e) {
            throw e;
        } catch (Throwable e) {
            return Failures.report(e, safeErr, debug(parsed));
        }
    }

    private static boolean asksForHelp(CommandLine.ParseResult parsed) {
        for (CommandLine.ParseResult p = parsed; p != null; p = p.subcommand()) {
            Object command = p.commandSpec().userObject();
            if (p.isUsageHelpRequested() || p.isVersionHelpRequested() || command instanceof CommandLine.HelpCommand
                    || (command instanceof Main && !p.hasSubcommand())) {
                return true;
            }
        }
        return false;
    }

    private static boolean debug(CommandLine.ParseResult parsed) {
        for (CommandLine.ParseResult p = parsed; p != null; p = p.subcommand()) {
            if (p.hasMatchedOption("--debug")) {
                return true;
            }
        }
        return false;
    }
}
