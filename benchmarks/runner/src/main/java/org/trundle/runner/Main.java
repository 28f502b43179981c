package org.trundle.runner;

import java.io.PrintStream;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;

import picocli.CommandLine;
import picocli.CommandLine.Command;

import org.trundle.scenario.ScenarioException;

/**
 * Command-line entry point of the executable jar {@code trundle.jar}: the scenario runner.
 *
 * <pre>
 * java -jar trundle.jar run SCENARIO.json --out DIR
 * java -jar trundle.jar sweep SCENARIO.json --out DIR [--threads N]
 * java -jar trundle.jar demo [--out DIR]
 * </pre>
 *
 * Exit codes: 0 done; 1 the run failed numerically or an output could not be written; 2 bad input
 * (scenario or command line), reported as one line on standard error.
 */
@Command(name = "trundle", mixinStandardHelpOptions = true, versionProvider = Main.Version.class,
    subcommands = {RunCommand.class, SweepCommand.class, DemoCommand.class, CommandLine.HelpCommand.class},
    description = {"Simulates a rigid ball rolling, sliding, flying and leaving a rigid surface, from a JSON scenario.",
        "All values SI: m, kg, s, N, rad/s; angles in degrees where the key ends in _deg."},
    footer = {"", "Exit codes: 0 done, 1 run failed or output not written, 2 bad scenario or command line."})
public final class Main implements Runnable {
    /** Exit code for bad input. */
    static final int BAD_INPUT = 2;
    /** Exit code for a failed run or an output error. */
    static final int FAILED = 1;

    @CommandLine.Spec
    private CommandLine.Model.CommandSpec spec;

    /** Created by picocli. */
    public Main() {
    }

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    /**
     * @param args command line
     */
    public static void main(String[] args) {
        if (args.length > 0 && !args[0].startsWith("-")) {
            preload();
        }
        int code = execute(System.out, System.err, args);
        System.exit(code);
    }

    /**
     * Loads and initialises the scenario reader (Jackson) and the solver's first classes on a second
     * core while the main thread reads the command line; the command then finds them ready. A class
     * that fails here fails again, with its error, where the command uses it.
     */
    private static void preload() {
        Thread t = new Thread(() -> {
            ClassLoader loader = Main.class.getClassLoader();
            for (String name : new String[] {"org.trundle.scenario.ScenarioFiles", "org.trundle.core.Simulation",
                "org.trundle.core.engine.Engine", "org.hipparchus.ode.nonstiff.DormandPrince853Integrator"}) {
                try {
                    Class.forName(name, true, loader);
                } catch (ClassNotFoundException | LinkageError e) {
                    return;
                }
            }
        }, "preload");
        t.setDaemon(true);
        t.start();
    }

    /**
     * Runs a command line with the given streams.
     *
     * @param out standard output
     * @param err standard error (messages, the progress bar)
     * @param args command line
     * @return the exit code
     */
    static int execute(PrintStream out, PrintStream err, String... args) {
        CommandLine cl = new CommandLine(new Main());
        PrintWriter o = new PrintWriter(new java.io.OutputStreamWriter(out, StandardCharsets.UTF_8), true);
        PrintWriter e = new PrintWriter(new java.io.OutputStreamWriter(err, StandardCharsets.UTF_8), true);
        cl.setOut(o);
        cl.setErr(e);
        for (CommandLine sub : cl.getSubcommands().values()) {
            Object user = sub.getCommand();
            if (user instanceof ErrStream) {
                ((ErrStream) user).errStream(err);
            }
        }
        cl.setParameterExceptionHandler((ex, a) -> {
            String name = ex.getCommandLine().getCommandName();
            e.println("trundle: error: " + ex.getMessage() + " (see: trundle " + (name.equals("trundle") ? "" : name + " ")
                + "--help)");
            return BAD_INPUT;
        });
        cl.setExecutionExceptionHandler((ex, c, parsed) -> {
            if (ex instanceof ScenarioException) {
                e.println("trundle: error: " + ex.getMessage());
                return BAD_INPUT;
            }
            e.println("trundle: failed: " + describe(ex));
            return FAILED;
        });
        int code = cl.execute(args);
        o.flush();
        e.flush();
        return code;
    }

    /**
     * One line for an exception that ends a command: file-system errors in words (the file and
     * what went wrong), others with their type; long values cut.
     *
     * @param ex the exception
     * @return the line
     */
    static String describe(Throwable ex) {
        Throwable t = ex instanceof java.io.UncheckedIOException && ex.getCause() != null ? ex.getCause() : ex;
        String m;
        if (t instanceof java.nio.file.AccessDeniedException) {
            m = "cannot write " + ((java.nio.file.FileSystemException) t).getFile() + ": permission denied";
        } else if (t instanceof java.nio.file.NoSuchFileException) {
            m = "cannot write " + ((java.nio.file.FileSystemException) t).getFile() + ": its folder does not exist";
        } else if (t instanceof java.nio.file.FileSystemException) {
            java.nio.file.FileSystemException f = (java.nio.file.FileSystemException) t;
            m = "cannot write " + f.getFile() + (f.getReason() == null ? "" : ": " + f.getReason());
        } else {
            m = t.getClass().getSimpleName() + (t.getMessage() == null ? "" : ": " + t.getMessage());
        }
        m = m.replace('\n', ' ').replace('\r', ' ');
        return m.length() > 1000 ? m.substring(0, 1000) + "... (message cut)" : m;
    }

    /** A command that draws on standard error (the progress bar). */
    interface ErrStream {
        void errStream(PrintStream err);
    }

    /** Version text from the jar's manifest, or "development". */
    static final class Version implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            String v = Main.class.getPackage().getImplementationVersion();
            return new String[] {"trundle " + (v == null ? "(development build)" : v)};
        }
    }
}
