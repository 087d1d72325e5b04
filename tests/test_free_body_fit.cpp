// The free-body view's fit (FreeBodyPainter::fitted, which lays one painter
// out again at each zoom it tries) against painters made afresh at the zoom
// and placement it returns, on every body of three samples in rooms from a
// laptop's pane to a wide one: the halves fit there, a zoom a little larger
// does not fit in either placement (unless the zoom is at its limit), and the
// fit never goes below the readable zoom where something fits there.
#include "core/results/free_body.h"
#include "core/solver/cycle_sweep.h"
#include "render/free_body_painter.h"
#include "tests/sample_file.h"

#include <gtest/gtest.h>

#include <string>

using namespace clevis;
using namespace clevis::ui;

namespace {

constexpr double kMinZoom = 0.1, kMaxZoom = 10.0, kTextScale = 1.2;
constexpr double kReadableZoom = 0.4;  // of the text's scale (free_body_painter.cpp)

bool fitsAfresh(const CompiledMechanism& m, const CycleResult& r, const FreeBodyDiagram& d,
                FreeBodyPaintOptions options, double zoom, KineticPlacement placement, QSizeF room)
{
    options.zoom = zoom;
    options.kinetic = placement;
    const FreeBodyPainter f(m, r, d, options);
    const double gap = FreeBodyPainter::fittedGap(options.textScale);
    const QSizeF halves = f.bodyHalf().united(f.kineticHalf()).size() + 2 * QSizeF(gap, gap);
    return halves.width() <= room.width() && halves.height() <= room.height();
}

TEST(FreeBodyFit, IsTheLargestZoomThatFitsAsPaintersMadeAfreshFindIt)
{
    int fitted = 0;
    for (const char* sample : {"dwell_six_bar", "punch_press", "tote_arm"}) {
        const CompiledMechanism m = compile(test::loadSample(sample));
        const CycleResult r = sweepCycle(m);
        for (int body = 0; body < int(m.bodies.size()); ++body)
            for (const int step : {0, int(r.steps.size()) / 3, int(r.steps.size()) * 2 / 3})
                for (const bool dAlembert : {false, true})
                    for (const QSizeF room :
                         {QSizeF(560, 266), QSizeF(583, 399), QSizeF(380, 820), QSizeF(1500, 560), QSizeF(459, 259)}) {
                        const FreeBodyDiagram d = freeBodyDiagram(m, r, body, step);
                        FreeBodyPaintOptions options{RenderUnits{}, dAlembert, true};
                        options.textScale = kTextScale;
                        const FreeBodyPaintOptions fit =
                            FreeBodyPainter::fitted(m, r, d, options, room, kMinZoom, kMaxZoom);
                        const std::string what = std::string(sample) + " " + d.bodyName + " step " +
                                                 std::to_string(step) + (dAlembert ? " d'Alembert" : "") + " in " +
                                                 std::to_string(int(room.width())) + "×" +
                                                 std::to_string(int(room.height()));
                        const double readable = kReadableZoom * kTextScale;
                        const bool fitsReadable =
                            fitsAfresh(m, r, d, options, readable, KineticPlacement::Beside, room) ||
                            (!dAlembert && fitsAfresh(m, r, d, options, readable, KineticPlacement::Below, room));
                        if (!fitsReadable) {
                            EXPECT_DOUBLE_EQ(fit.zoom, readable) << what;  // nothing fits: the readable zoom
                            continue;
                        }
                        ++fitted;
                        EXPECT_TRUE(fitsAfresh(m, r, d, options, fit.zoom, fit.kinetic, room)) << what;
                        if (fit.zoom >= kMaxZoom) continue;
                        const double larger = fit.zoom * 1.002;  // past the bisection's tolerance
                        EXPECT_FALSE(fitsAfresh(m, r, d, options, larger, fit.kinetic, room)) << what;
                        if (!dAlembert) {
                            const KineticPlacement other = fit.kinetic == KineticPlacement::Beside
                                                               ? KineticPlacement::Below
                                                               : KineticPlacement::Beside;
                            EXPECT_FALSE(fitsAfresh(m, r, d, options, larger * 1.001, other, room)) << what;
                        }
                    }
    }
    EXPECT_GT(fitted, 50);
}

}  // namespace
