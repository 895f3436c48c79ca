package dev.skerry.compiler.solve;

/** Whether a backend can take a model; when it cannot, a reason a user can act on. */
public record Capability(boolean capable, String reason) {
  public Capability {
    reason = reason == null ? "" : reason;
    if (!capable && reason.isEmpty()) {
      throw new IllegalArgumentException("an incapable backend must say why");
    }
  }

  public static Capability yes() {
    return new Capability(true, "");
  }

  public static Capability no(String reason) {
    return new Capability(false, reason);
  }
}
