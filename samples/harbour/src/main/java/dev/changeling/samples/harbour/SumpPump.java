package dev.changeling.samples.harbour;

/** The lock's sump pump: it runs while the float switch hangs down, that is while the sump is not yet full. */
public final class SumpPump {

    public boolean runs(boolean floatSwitchDown) {
        boolean full = !floatSwitchDown;
        return !full;
    }
}
