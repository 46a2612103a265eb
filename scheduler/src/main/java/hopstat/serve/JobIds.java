package hopstat.serve;

import java.util.Locale;
import java.util.regex.Pattern;

/**
 * Job ids: {@code NNNNNN-name}, a zero-padded submission number and the spec name reduced to {@code
 * [A-Za-z0-9_-]} (at most {@value #NAME_LENGTH} characters). Ids are used as directory names under
 * {@code ROOT/jobs}, so anything that does not match {@link #isValid} — a slash, a dot, a {@code
 * ..}, an empty name — is refused before it comes near a path.
 */
public final class JobIds {

  /** Longest name part of an id. */
  public static final int NAME_LENGTH = 40;

  private static final Pattern ID =
      Pattern.compile("[0-9]{6,9}-[A-Za-z0-9][A-Za-z0-9_-]{0," + (NAME_LENGTH - 1) + "}");

  private JobIds() {}

  /** True if {@code id} is a well-formed job id (and so a safe single directory name). */
  public static boolean isValid(String id) {
    return id != null && ID.matcher(id).matches();
  }

  /** The id of submission {@code sequence} of a spec named {@code name}. */
  public static String of(long sequence, String name) {
    return String.format(Locale.ROOT, "%06d-%s", sequence, sanitise(name));
  }

  /** The sequence number of a valid id. */
  public static long sequence(String id) {
    if (!isValid(id)) {
      throw new IllegalArgumentException("not a job id: " + id);
    }
    return Long.parseLong(id.substring(0, id.indexOf('-')));
  }

  /** A name reduced to {@code [A-Za-z0-9_-]}, starting with a letter or digit, never empty. */
  static String sanitise(String name) {
    String s = name == null ? "" : name.replaceAll("[^A-Za-z0-9_-]+", "-").replaceAll("^[-_]+", "");
    if (s.length() > NAME_LENGTH) {
      s = s.substring(0, NAME_LENGTH);
    }
    return s.isEmpty() ? "job" : s;
  }
}
