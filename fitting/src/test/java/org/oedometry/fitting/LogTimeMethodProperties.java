package org.oedometry.fitting;

import org.oedometry.core.SettlementCurve;

/** The {@link ConstructionInvariants} of the log-time construction. */
class LogTimeMethodProperties extends ConstructionInvariants<LogTimeResult> {

  @Override
  LogTimeResult fit(SettlementCurve curve, double drainagePath) {
    return LogTimeMethod.fit(curve, drainagePath);
  }

  @Override
  double d0(LogTimeResult result) {
    return result.d0();
  }

  @Override
  double d100(LogTimeResult result) {
    return result.d100();
  }
}
