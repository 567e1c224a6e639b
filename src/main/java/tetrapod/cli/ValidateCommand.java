package tetrapod.cli;

import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** Reads a spec and builds its model; reports every problem with its JSON path and line. */
@Command(name = "validate", mixinStandardHelpOptions = true,
        description = "Check a tower spec: every problem is printed with its JSON path and line; "
                + "exit code 0 when the spec is valid, 2 when it is not.")
final class ValidateCommand implements Callable<Integer> {

    @Parameters(paramLabel = "MODEL.json", description = "The tower spec to check.")
    Path model;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        LoadedModel loaded = LoadedModel.checked(model);
        spec.commandLine().getOut().printf("%s: valid (%d nodes, %d members)%n", model,
                loaded.tower().frame().nodes().size(), loaded.tower().frame().members().size());
        return ExitCode.DONE;
    }
}
