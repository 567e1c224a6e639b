package tetrapod.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.EnumMap;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;
import tetrapod.generate.ExplicitSpecs;
import tetrapod.generate.SteelMass;
import tetrapod.generate.Tower;
import tetrapod.io.AtomicFiles;
import tetrapod.io.OutputFiles;
import tetrapod.io.SpecWriter;
import tetrapod.model.Frame;
import tetrapod.model.Member;
import tetrapod.model.Role;

/** Builds the 3D model of a tower spec, prints its summary and writes it as an explicit-frame spec. */
@Command(name = "geometry", mixinStandardHelpOptions = true,
        description = "Build the tower's 3D model; print nodes, members by role and steel mass; "
                + "write the model as a spec that gives every node and member.")
final class GeometryCommand implements Callable<Integer> {

    @Parameters(paramLabel = "MODEL.json", description = "The tower spec.")
    Path model;

    @Option(names = {"-o", "--output"}, paramLabel = "FILE",
            description = "Where to write the node-by-node spec (default: out/<model file name>/frame.json).")
    Path output;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        LoadedModel loaded = LoadedModel.checked(model);
        Path target = output != null ? output : OutputFolders.forModel(model).resolve("frame.json");
        OutputFiles.check(target);
        Tower tower = loaded.tower();
        Frame frame = tower.frame();
        PrintWriter out = spec.commandLine().getOut();

        out.println(frame.name());
        out.printf(Locale.ROOT, "  idealisation   %s%n", frame.idealisation().jsonName());
        if (tower.isGenerated()) {
            out.printf(Locale.ROOT, "  height         %.3f m, %d segments, %d panels%n", tower.height(),
                    loaded.spec().segments().size(), tower.panels().size());
        }
        out.printf(Locale.ROOT, "  nodes          %d%n", frame.nodes().size());
        out.printf(Locale.ROOT, "  supports       %d%n", frame.supports().size());
        out.printf(Locale.ROOT, "  members        %d%n", frame.members().size());
        Map<Role, Integer> counts = new EnumMap<>(Role.class);
        for (Member m : frame.members()) {
            counts.merge(m.role(), 1, Integer::sum);
        }
        Map<Role, Double> massByRole = SteelMass.byRole(frame);
        counts.forEach((role, n) -> out.printf(Locale.ROOT, "    %-12s %6d   %10.1f kg%n", role.jsonName(), n,
                massByRole.getOrDefault(role, 0.0)));
        out.printf(Locale.ROOT, "  steel mass     %.1f kg bare; %.1f kg with the %.0f %% connection allowance%n",
                tower.steelMass(), tower.steelMassWithAllowance(), 100 * tower.connectionAllowance());

        AtomicFiles.writeString(target, SpecWriter.write(ExplicitSpecs.asExplicit(loaded.spec(), frame)));
        out.println("  model written  " + target);
        return ExitCode.DONE;
    }
}
