package org.ventcase.cli;

import java.io.IOException;
import java.io.InputStream;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.util.Properties;
import java.util.concurrent.Callable;

import org.ventcase.common.ConvergenceException;
import org.ventcase.common.InvalidInputException;
import org.ventcase.common.NoSolutionException;

import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/**
 * The {@code ventcase} command: with no arguments it prints help (the wizard comes in a later
 * release); with a sub-command it runs headless. Only this class calls {@link System#exit}.
 */
@Command(name = "ventcase", mixinStandardHelpOptions = true, versionProvider = Main.Version.class,
        header = "Ventcase: first-pass relief basis for vessels holding liquefied gases and volatile liquids.",
        description = {"Cubic equations of state, vessel geometry and published relief equations.",
                "First-pass estimates only: final relief design must be verified by a qualified engineer under "
                        + "the applicable codes (e.g. ASME BPVC Section VIII, API Std 520/521, ISO 4126/23251) "
                        + "and local regulations."},
        subcommands = {DemoCommand.class, SheetCommand.class, PropsCommand.class, SatCommand.class,
                VesselCommand.class, InventoryCommand.class, FlashCommand.class, EnvelopeCommand.class,
                NewCommand.class, CheckCommand.class, CalcCommand.class,
                CommandLine.HelpCommand.class},
        footer = ExitCode.HELP_LIST)
public final class Main implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        spec.commandLine().usage(spec.commandLine().getOut());
        return ExitCode.OK;
    }

    public static void main(String[] args) {
        PrintWriter out = new PrintWriter(System.out, true);
        PrintWriter err = new PrintWriter(System.err, true);
        System.exit(run(out, err, args));
    }

    /** Runs the command line with the given writers; returns the exit code. */
    public static int run(PrintWriter out, PrintWriter err, String... args) {
        CommandLine cl = new CommandLine(new Main());
        cl.setOut(out);
        cl.setErr(err);
        cl.setParameterExceptionHandler((ex, a) -> {
            CommandLine c = ex.getCommandLine();
            c.getErr().println("ventcase: " + ex.getMessage());
            c.getErr().println("Try '" + c.getCommandSpec().qualifiedName() + " --help'.");
            return ExitCode.INVALID_INPUT;
        });
        cl.setExecutionExceptionHandler((ex, c, parsed) -> {
            PrintWriter e = c.getErr();
            if (ex instanceof InvalidInputException || ex instanceof NoSolutionException) {
                e.println("ventcase: " + ex.getMessage());
                return ExitCode.INVALID_INPUT;
            }
            if (ex instanceof ConvergenceException) {
                e.println("ventcase: " + ex.getMessage());
                return ExitCode.NO_CONVERGENCE;
            }
            if (ex instanceof IOException || ex instanceof UncheckedIOException) {
                e.println("ventcase: file error: " + ex.getMessage());
                return ExitCode.IO;
            }
            e.println("ventcase: internal error (please report with the command line used): " + ex);
            ex.printStackTrace(e);
            return ExitCode.INTERNAL;
        });
        int code = cl.execute(args);
        out.flush();
        err.flush();
        return code;
    }

    /** The version from the build (resource filtered by Maven). */
    static final class Version implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            return new String[] {"ventcase " + version()};
        }
    }

    /** This build's version string. */
    public static String version() {
        try (InputStream in = Main.class.getResourceAsStream("/org/ventcase/version.properties")) {
            Properties p = new Properties();
            if (in != null) {
                p.load(in);
            }
            return p.getProperty("version", "unknown");
        } catch (IOException e) {
            return "unknown";
        }
    }
}
