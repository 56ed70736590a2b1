package dev.sigmawalk.reports.api;

/** Refuses a null argument of the library API by name, instead of a NullPointerException deep inside. */
final class Given {
    private Given() {
    }

    /**
     * @param what the argument, as the caller knows it ("the study")
     * @param expected what to pass, such as "Study.fromYaml(file).spec()"
     * @throws IllegalArgumentException when {@code value} is null
     */
    static <T> T required(T value, String what, String expected) {
        if (value == null) {
            throw new IllegalArgumentException(what + " is null; expected " + expected);
        }
        return value;
    }

    static <T> T study(T study) {
        return required(study, "the study", "a study as read, such as Study.fromYaml(file).spec()");
    }

    static <T> T data(T data) {
        return required(data, "the data", "the study's data, StudyData.load(study)");
    }

    static <T> T run(T run) {
        return required(run, "the run", "the result of Runs.walk");
    }
}
