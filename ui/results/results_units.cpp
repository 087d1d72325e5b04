#include "ui/results/results_units.h"

#include "ui/shell/display_units.h"

namespace clevis::ui {

RenderUnits renderUnits(const DisplayUnits& units)
{
    // Every unit choice is a pure scale of SI, so one factor each describes it.
    return {units.lengthFromSi(1.0), units.lengthSymbol(), units.forceFromSi(1.0), units.forceSymbol(),
            units.torqueFromSi(1.0), units.torqueSymbol()};
}

}  // namespace clevis::ui
