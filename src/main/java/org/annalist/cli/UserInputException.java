package org.annalist.cli;

/** A mistake in what the user asked for (a series name that is not in the file, say): exit 2, message only. */
final class UserInputException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    UserInputException(String message) {
        super(message);
    }
}
