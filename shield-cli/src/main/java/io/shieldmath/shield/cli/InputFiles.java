/*
 * Copyright 2026 The shield authors. Licensed under the Apache License, Version 2.0.
 */
package io.shieldmath.shield.cli;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.InvalidPathException;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.nio.file.attribute.BasicFileAttributes;

/**
 * Opens the files named on the command line, refusing anything that is not a regular file
 * before opening it: opening a named pipe (FIFO) for reading waits for a writer, possibly for
 * ever, and a directory or device is never a design. Every failure names the file, its role
 * and the reason, for example {@code "cannot read design file /tmp: is a directory"}.
 *
 * <p>The kind is checked on the file's attributes (symbolic links followed), then the file is
 * opened; a file replaced by a pipe between the two steps is not detected.
 */
final class InputFiles {

    private InputFiles() {
    }

    /**
     * Opens a regular file for reading.
     *
     * @param role the file's role in messages, for example {@code "design file"}
     * @param name the file name as given on the command line
     * @return the open stream; the caller closes it
     * @throws CommandFailure with exit code {@link BatchCommand#IO_ERROR} if the file does not
     *                        exist, is not a regular file or cannot be opened
     */
    static InputStream open(String role, String name) throws CommandFailure {
        String prefix = "cannot read " + role + " " + Messages.fileName(name) + ": ";
        Path path;
        try {
            path = Paths.get(name);
        } catch (InvalidPathException e) {
            throw CommandFailure.unreadable(prefix + "not a valid file name (" + e.getReason() + ")", e);
        }
        BasicFileAttributes attributes;
        try {
            attributes = Files.readAttributes(path, BasicFileAttributes.class);
        } catch (IOException e) {
            throw CommandFailure.unreadable(prefix + reason(e), e);
        }
        if (attributes.isDirectory()) {
            throw CommandFailure.unreadable(prefix + "is a directory", null);
        }
        if (!attributes.isRegularFile()) {
            throw CommandFailure.unreadable(prefix + "not a regular file (a named pipe, device or socket)", null);
        }
        try {
            return Files.newInputStream(path);
        } catch (IOException e) {
            throw CommandFailure.unreadable(prefix + reason(e), e);
        }
    }

    /** The reason an I/O operation failed, in words, without the file name the exception may repeat. */
    static String reason(IOException e) {
        if (e instanceof NoSuchFileException) {
            return "no such file";
        }
        if (e instanceof AccessDeniedException) {
            return "permission denied";
        }
        if (e instanceof FileSystemException f && f.getReason() != null) {
            return f.getReason();
        }
        return e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
    }
}
