package org.oedometry.fitting;

import org.oedometry.core.SettlementCurve;

/** The {@link ConstructionInvariants} of the root-time construction. */
class RootTimeMethodProperties extends ConstructionInvariants<RootTimeResult> {

  @Override
  RootTimeResult fit(SettlementCurve curve, double drainagePath) {
    return RootTimeMethod.fit(curve, drainagePath);
  }

  @Override
  double d0(RootTimeResult result) {
    return result.d0();
  }

  @Override
  double d100(RootTimeResult result) {
    return result.d100();
  }
}
