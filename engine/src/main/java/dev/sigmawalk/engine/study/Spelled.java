package dev.sigmawalk.engine.study;

/** An option whose study-file spelling is fixed by the contract (for example {@code single-index}). */
public interface Spelled {
    /** The exact word used in the study file. */
    String spelling();

    /** The enum constant spelled {@code word}, or {@code null} when none is. */
    static <E extends Enum<E> & Spelled> E parse(Class<E> type, String word) {
        for (E e : type.getEnumConstants()) {
            if (e.spelling().equals(word)) {
                return e;
            }
        }
        return null;
    }

    /** All spellings of {@code type}, joined with " | ", for messages. */
    static <E extends Enum<E> & Spelled> String choices(Class<E> type) {
        StringBuilder sb = new StringBuilder();
        for (E e : type.getEnumConstants()) {
            if (sb.length() > 0) {
                sb.append(" | ");
            }
            sb.append(e.spelling());
        }
        return sb.toString();
    }
}
