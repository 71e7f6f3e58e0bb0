package org.ventcase.cli;

import java.io.IOException;
import java.io.InputStream;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;
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
 * The {@code ventcase} command: with no arguments it opens the case wizard where a display is
 * available (otherwise it says how to run headless and prints help); with a sub-command it runs
 * headless. Only this class calls {@link System#exit}.
 */
@Command(name = "ventcase", mixinStandardHelpOptions = true, versionProvider = Main.Version.class,
        header = "Ventcase: first-pass relief basis for vessels holding liquefied gases and volatile liquids.",
        description = {"Cubic equations of state, vessel geometry and published relief equations.",
                Main.FIRST_PASS_HELP},
        subcommands = {DemoCommand.class, SheetCommand.class, PropsCommand.class, SatCommand.class,
                VesselCommand.class, InventoryCommand.class, FlashCommand.class, EnvelopeCommand.class,
                NewCommand.class, CheckCommand.class, CalcCommand.class, ReviewCommand.class, AuditCommand.class,
                CommandLine.HelpCommand.class},
        footer = ExitCode.HELP_LIST)
public final class Main implements Callable<Integer> {

    /** The caution closing the help of the commands that print results. */
    static final String FIRST_PASS_HELP = "First-pass estimates only: final relief design must be verified by a "
            + "qualified engineer under the applicable codes (e.g. ASME BPVC Section VIII, API Std 520/521, "
            + "ISO 4126/23251) and local regulations.";

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        spec.commandLine().usage(spec.commandLine().getOut());
        return ExitCode.OK;
    }

    /**
     * True only in {@link #main}: commands may open a window. {@link #run} (scripts' and tests' entry)
     * stays headless.
     */
    static volatile boolean windowsAllowed;

    public static void main(String[] args) {
        PrintWriter out = new PrintWriter(System.out, true);
        PrintWriter err = new PrintWriter(System.err, true);
        windowsAllowed = true;
        if (BatchJvm.wanted(args, java.lang.management.ManagementFactory.getRuntimeMXBean().getInputArguments(),
                System.getenv("VENTCASE_FORK"))) {
            java.util.Optional<Integer> code = BatchJvm.run(args);
            if (code.isPresent()) {
                System.exit(code.get());
            }
        }
        if (args.length == 0) {
            if (displayAvailableHere()) {
                if (org.ventcase.ui.WizardLauncher.launch()) {
                    System.exit(ExitCode.OK);
                }
                err.println(org.ventcase.ui.WizardLauncher.NO_WINDOW);
            }
            out.println(NO_DISPLAY);
            out.println();
        }
        System.exit(run(out, err, args));
    }

    /** Printed when {@code ventcase} is started without arguments and without a display. */
    static final String NO_DISPLAY = "ventcase: no display is available, so the case wizard cannot open. Run the "
            + "headless commands instead, e.g. 'ventcase new --template vertical-drum case.json', "
            + "'ventcase check case.json', 'ventcase demo --text'; or start the wizard where a display is available "
            + "(on a server: 'Xvfb :99 &' and DISPLAY=:99). Commands:";

    /** {@link #displayAvailable} for this process's environment. */
    static boolean displayAvailableHere() {
        return displayAvailable(System.getenv("DISPLAY"), System.getenv("WAYLAND_DISPLAY"),
                System.getProperty("java.awt.headless"), System.getProperty("os.name"));
    }

    /**
     * True when a window can be opened: Windows and macOS have a display; elsewhere DISPLAY or
     * WAYLAND_DISPLAY must be set; never when java.awt.headless is true.
     */
    static boolean displayAvailable(String display, String wayland, String headless, String osName) {
        if ("true".equalsIgnoreCase(headless)) {
            return false;
        }
        String os = osName == null ? "" : osName.toLowerCase(java.util.Locale.ROOT);
        if (os.startsWith("windows") || os.startsWith("mac")) {
            return true;
        }
        return display != null && !display.isBlank() || wayland != null && !wayland.isBlank();
    }

    /**
     * A file error in the user's terms: the file and what is wrong with it, without exception class
     * names ("no such file", "permission denied", "is a symbolic link: ...").
     */
    static String fileError(Throwable ex) {
        Throwable t = ex instanceof UncheckedIOException u && u.getCause() != null ? u.getCause() : ex;
        String stem = ex instanceof UncheckedIOException && ex.getMessage() != null
                ? ex.getMessage().replaceFirst(": .*$", "") : "";
        if (t instanceof java.nio.file.FileSystemException f) {
            String what;
            if (t instanceof java.nio.file.NoSuchFileException) {
                what = "no such file or folder" + (f.getReason() != null ? " (" + f.getReason() + ")" : "");
            } else if (t instanceof java.nio.file.AccessDeniedException) {
                what = "permission denied";
            } else {
                what = f.getReason() != null ? f.getReason() : "cannot be used";
            }
            String file = f.getFile() == null ? "" : f.getFile();
            if (stem.isEmpty()) {
                return file + ": " + what;
            }
            return stem.endsWith(file) ? stem + ": " + what : stem + ": " + file + ": " + what;
        }
        return ex.getMessage() == null ? "cannot read or write a file" : ex.getMessage();
    }

    /**
     * The sub-commands by name, read from this class's @Command annotation (the one list): the
     * annotation is read directly, without picocli building a model of every command.
     */
    private static final java.util.Map<String, Class<?>> COMMANDS = commands();

    private static java.util.Map<String, Class<?>> commands() {
        java.util.Map<String, Class<?>> m = new java.util.LinkedHashMap<>();
        for (Class<?> c : Main.class.getAnnotation(Command.class).subcommands()) {
            Command cmd = c.getAnnotation(Command.class);
            if (cmd != null && c != CommandLine.HelpCommand.class) {
                m.put(cmd.name(), c);
            }
        }
        return java.util.Collections.unmodifiableMap(m);
    }

    /** The root command when one sub-command is run: the same name and options, that one sub-command only. */
    @Command(name = "ventcase", mixinStandardHelpOptions = true, versionProvider = Main.Version.class,
            footer = ExitCode.HELP_LIST)
    static final class One implements Callable<Integer> {
        @Override
        public Integer call() {
            return ExitCode.OK;
        }
    }

    /**
     * The command line for these arguments: for a known sub-command only that one is built (picocli
     * reads every command's annotations when it builds one, most of a short command's start), else
     * the whole command with its help listing.
     */
    static CommandLine commandLine(String... args) {
        Class<?> one = args.length > 0 ? COMMANDS.get(args[0]) : null;
        if (one == null) {
            return new CommandLine(new Main());
        }
        CommandLine cl = new CommandLine(new One());
        cl.addSubcommand(args[0], one);
        return cl;
    }

    /** Runs the command line with the given writers; returns the exit code. */
    public static int run(PrintWriter out, PrintWriter err, String... args) {
        CommandLine cl = commandLine(args);
        cl.setOut(out);
        cl.setErr(err);
        cl.setParameterExceptionHandler((ex, a) -> {
            CommandLine c = ex.getCommandLine();
            c.getErr().println("ventcase: " + usageError(ex));
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
                e.println("ventcase: file error: " + fileError(ex));
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

    /**
     * A command-line mistake in the user's terms: which word or option is wrong and what is
     * expected, without the parser's own phrasing (issue 19, item 8).
     */
    static String usageError(CommandLine.ParameterException ex) {
        CommandLine c = ex.getCommandLine();
        String cmd = c.getCommandSpec().qualifiedName();
        if (ex instanceof CommandLine.UnmatchedArgumentException u && !u.getUnmatched().isEmpty()) {
            String word = u.getUnmatched().get(0);
            List<String> hints = u.getSuggestions();
            String hint = hints.isEmpty() ? "" : "; did you mean " + String.join(" or ", hints) + "?";
            if (word.startsWith("-")) {
                return "'" + word + "' is not an option of " + cmd + hint;
            }
            if (!c.getSubcommands().isEmpty()) {
                return "'" + word + "' is not a command; expected one of " + String.join(", ", c.getSubcommands().keySet())
                        + hint;
            }
            int files = c.getCommandSpec().positionalParameters().size();
            return "'" + word + "' is not expected here: " + cmd + " takes "
                    + (files == 0 ? "options only" : files == 1 ? "one file name" : "no more than " + files + " file names");
        }
        if (ex instanceof CommandLine.MissingParameterException m && !m.getMissing().isEmpty()) {
            List<String> names = new ArrayList<>();
            for (CommandLine.Model.ArgSpec a : m.getMissing()) {
                names.add(a.isOption() ? ((CommandLine.Model.OptionSpec) a).longestName() + "=" + a.paramLabel()
                        : a.paramLabel());
            }
            return names.size() == 1 ? names.get(0) + ": missing; " + cmd + " needs it"
                    : String.join(" or ", names) + ": missing; " + cmd + " needs one of them";
        }
        if (ex instanceof CommandLine.MutuallyExclusiveArgsException) {
            return ex.getMessage().replaceFirst("^Error: ", "").replace(" are mutually exclusive (specify only one)",
                    ": give only one of these");
        }
        if (ex instanceof CommandLine.OverwrittenOptionException o && o.getOverwritten() != null
                && o.getOverwritten().isOption()) {
            return ((CommandLine.Model.OptionSpec) o.getOverwritten()).longestName() + ": given more than once; give it once";
        }
        return ex.getMessage().replaceFirst("^Error: ", "");
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
