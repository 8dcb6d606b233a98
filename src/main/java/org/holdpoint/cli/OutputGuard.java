package org.holdpoint.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Inputs are never harmed by outputs: before anything is read, every output path is checked against
 * every input (data, settings, template, keys) and against the other outputs, and an existing output
 * is kept unless {@code --overwrite} is given (README.md, "Outputs").
 */
final class OutputGuard {
    private final Map<String, Path> inputs = new LinkedHashMap<>();
    private final Map<String, Path> outputs = new LinkedHashMap<>();
    private final List<String> folders = new ArrayList<>();

    /**
     * Adds an input.
     *
     * @param what how the user named it, e.g. "the data file"
     * @param path the path, or null when not given
     * @return this
     */
    OutputGuard input(String what, Path path) {
        if (path != null) {
            inputs.put(what + " " + path, path);
        }
        return this;
    }

    /**
     * Adds an output file.
     *
     * @param option the option that names it, e.g. "--json"
     * @param path   the path, or null when not given
     * @return this
     */
    OutputGuard output(String option, Path path) {
        if (path != null) {
            outputs.put(option, path);
        }
        return this;
    }

    /**
     * Adds an output folder (files are written into it).
     *
     * @param option the option
     * @param path   the folder, or null
     * @return this
     */
    OutputGuard folder(String option, Path path) {
        if (path != null) {
            outputs.put(option, path);
            folders.add(option);
        }
        return this;
    }

    /**
     * Checks the outputs.
     *
     * @param overwrite whether existing output files may be replaced
     * @throws UserInputException naming the option and the file when an output would replace an input, two
     *                            outputs are one file, an output is not a regular file, or exists without
     *                            --overwrite
     */
    void check(boolean overwrite) {
        List<Map.Entry<String, Path>> outs = new ArrayList<>(outputs.entrySet());
        for (int i = 0; i < outs.size(); i++) {
            String option = outs.get(i).getKey();
            Path out = outs.get(i).getValue();
            for (Map.Entry<String, Path> in : inputs.entrySet()) {
                if (same(out, in.getValue())) {
                    throw new UserInputException("%s %s is %s: an output never replaces an input. Give another "
                            + "name for the output", option, out, in.getKey());
                }
            }
            for (int j = 0; j < i; j++) {
                if (same(out, outs.get(j).getValue())) {
                    throw new UserInputException("%s and %s name the same file %s; give each output its own name",
                            outs.get(j).getKey(), option, out);
                }
            }
            boolean folder = folders.contains(option);
            if (folder) {
                if (Files.exists(out) && !Files.isDirectory(out)) {
                    throw new UserInputException("%s %s is a file, not a folder; give a folder for the charts", option,
                            out);
                }
                continue;
            }
            if (Files.isDirectory(out)) {
                throw new UserInputException("%s %s is a folder; give a file name", option, out);
            }
            if (Files.exists(out) && !Files.isRegularFile(out)) {
                throw new UserInputException("%s %s is not a regular file (a device or pipe); give a file name",
                        option, out);
            }
            if (Files.exists(out) && !overwrite) {
                throw new UserInputException("%s exists; give --overwrite to replace it (%s)", out, option);
            }
        }
    }

    private static boolean same(Path a, Path b) {
        if (a.toAbsolutePath().normalize().equals(b.toAbsolutePath().normalize())) {
            return true;
        }
        try {
            return Files.exists(a) && Files.exists(b) && Files.isSameFile(a, b);
        } catch (IOException e) {
            throw new UserInputException("cannot compare %s with %s (%s); check the paths", a, b, e.getMessage());
        }
    }
}
