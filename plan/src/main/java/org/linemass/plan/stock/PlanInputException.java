package org.linemass.plan.stock;

/** A bad stock or price file: the message names the file, the line and the field. */
public final class PlanInputException extends Exception {

    private static final long serialVersionUID = 1L;

    public PlanInputException(String message) {
        super(message);
    }
}
