// Where the free-body figure puts its two halves (the free body and the
// kinetic diagram), on samples: in a room taller than wide the kinetic
// diagram goes under the free body and both halves, with every text drawn in
// them, lie inside the room and apart; in a wide room it stays beside; the
// texts drawn (every number) are the same either way.
#include "core/results/free_body.h"
#include "core/solver/cycle_sweep.h"
#include "render/free_body_painter.h"
#include "tests/recording_device.h"
#include "tests/sample_file.h"

#include <QPainter>

#include <gtest/gtest.h>

#include <algorithm>
#include <string>
#include <vector>

using namespace clevis;
using namespace clevis::ui;

namespace {

constexpr double kMinZoom = 0.1, kMaxZoom = 10.0;
constexpr double kTextScale = 1.3;  // a screen's interface font against the page's

struct Solved {
    CompiledMechanism m;
    CycleResult r;
};

Solved solveSample(const std::string& name)
{
    Solved s{compile(test::loadSample(name)), {}};
    s.r = sweepCycle(s.m);
    return s;
}

struct Case {
    const char* sample;
    const char* body;
    int step;
};

const Case kCases[] = {{"punch_press", "ram", 30},         {"punch_press", "connecting_rod", 30},
                       {"punch_press", "crankshaft", 200}, {"dwell_six_bar", "coupler_plate", 90},
                       {"dwell_six_bar", "rocker", 0},     {"dwell_six_bar", "finger_lever", 270}};

// The figure fitted to `room` as a view fits it: the halves in the room's middle.
struct Shown {
    FreeBodyPaintOptions options;
    std::vector<test::RecordedText> texts;
    QRectF body, kinetic;  // the halves, in the room
};

Shown shownIn(const Solved& s, const Case& c, QSizeF room)
{
    const FreeBodyDiagram d = freeBodyDiagram(s.m, s.r, findBody(s.m, c.body), c.step);
    FreeBodyPaintOptions options{RenderUnits{}, false, true};
    options.textScale = kTextScale;
    Shown shown;
    shown.options = FreeBodyPainter::fitted(s.m, s.r, d, options, room, kMinZoom, kMaxZoom);
    const FreeBodyPainter figure(s.m, s.r, d, shown.options);
    const QPointF origin =
        QRectF(QPointF(0, 0), room).center() - figure.bodyHalf().united(figure.kineticHalf()).center();
    test::RecordingDevice device(room.toSize());
    QPainter p(&device);
    figure.paint(p, QRectF(origin, figure.size()));
    p.end();
    shown.texts = test::joinedRuns(device.engine.texts);
    shown.body = figure.bodyHalf().translated(origin);
    shown.kinetic = figure.kineticHalf().translated(origin);
    return shown;
}

bool isKinetic(const QString& text)
{
    return text == "Kinetic diagram" || text.startsWith(QStringLiteral("m·a_G")) ||
           text.startsWith(QStringLiteral("I_G·α:"));
}

bool isOfFreeBody(const QString& text)
{
    const bool label = text.contains(QStringLiteral("∠")) || text.endsWith(QStringLiteral(" cw")) ||
                       text.endsWith(QStringLiteral(" ccw"));
    return !isKinetic(text) &&
           (text == "Free body" || text.startsWith("force scale") || text.startsWith("drawing scale") || label);
}

// Both halves inside the room and apart, each half's texts inside it.
void expectWholeAndApart(const Shown& shown, QSizeF room, const std::string& what)
{
    const QRectF area = QRectF(QPointF(0, 0), room).adjusted(-0.5, -0.5, 0.5, 0.5);
    EXPECT_TRUE(area.contains(shown.body)) << what;
    EXPECT_TRUE(area.contains(shown.kinetic)) << what;
    EXPECT_FALSE(shown.body.intersects(shown.kinetic)) << what;
    int kinetic = 0, body = 0;
    for (const test::RecordedText& t : shown.texts) {
        const std::string text = what + ": '" + t.text.toStdString() + "'";
        if (isKinetic(t.text)) {
            ++kinetic;
            EXPECT_TRUE(shown.kinetic.adjusted(-0.5, -0.5, 0.5, 0.5).contains(t.box)) << text;
        } else if (isOfFreeBody(t.text)) {
            ++body;
            EXPECT_TRUE(shown.body.adjusted(-0.5, -0.5, 0.5, 0.5).contains(t.box)) << text;
        }
    }
    EXPECT_GE(kinetic, 2) << what;  // the heading and a label at least
    EXPECT_GE(body, 4) << what;
}

TEST(FreeBodyLayout, ARoomTallerThanWideHasTheKineticDiagramUnderTheFreeBody)
{
    const QSizeF room(380, 820);
    for (const Case& c : kCases) {
        const Solved s = solveSample(c.sample);
        const Shown shown = shownIn(s, c, room);
        const std::string what = std::string(c.sample) + " " + c.body;
        EXPECT_EQ(shown.options.kinetic, KineticPlacement::Below) << what;
        EXPECT_GT(shown.kinetic.top(), shown.body.bottom()) << what;
        expectWholeAndApart(shown, room, what);
    }
}

TEST(FreeBodyLayout, AWideRoomKeepsTheKineticDiagramBeside)
{
    const QSizeF room(1500, 560);
    for (const Case& c : kCases) {
        const Solved s = solveSample(c.sample);
        const Shown shown = shownIn(s, c, room);
        const std::string what = std::string(c.sample) + " " + c.body;
        EXPECT_EQ(shown.options.kinetic, KineticPlacement::Beside) << what;
        EXPECT_GT(shown.kinetic.left(), shown.body.right()) << what;
        expectWholeAndApart(shown, room, what);
    }
}

// The page's own layout, as exported, is the kinetic diagram beside the free body.
TEST(FreeBodyLayout, ThePageIsSideBySide)
{
    const Solved s = solveSample("punch_press");
    const FreeBodyPainter page(s.m, s.r, freeBodyDiagram(s.m, s.r, findBody(s.m, "ram"), 30), {RenderUnits{}});
    EXPECT_EQ(page.options().kinetic, KineticPlacement::Beside);
    EXPECT_NEAR(page.kineticHalf().top(), page.bodyHalf().top(), 1e-9);
    EXPECT_GT(page.kineticHalf().left(), page.bodyPanel().right());
}

// Moving the kinetic diagram moves text, it changes none: the same texts, numbers and all.
TEST(FreeBodyLayout, EitherPlacementDrawsTheSameTexts)
{
    for (const Case& c : kCases) {
        const Solved s = solveSample(c.sample);
        const FreeBodyDiagram d = freeBodyDiagram(s.m, s.r, findBody(s.m, c.body), c.step);
        std::vector<QString> drawn[2];
        for (const KineticPlacement placement : {KineticPlacement::Beside, KineticPlacement::Below}) {
            FreeBodyPaintOptions options{RenderUnits{}, false, true};
            options.zoom = 0.6;
            options.textScale = kTextScale;
            options.kinetic = placement;
            const FreeBodyPainter figure(s.m, s.r, d, options);
            test::RecordingDevice device(figure.size().toSize());
            QPainter p(&device);
            figure.paint(p, QRectF(QPointF(0, 0), figure.size()));
            p.end();
            for (const test::RecordedText& t : device.engine.texts) drawn[int(placement)].push_back(t.text);
            std::sort(drawn[int(placement)].begin(), drawn[int(placement)].end());
        }
        EXPECT_EQ(drawn[0], drawn[1]) << c.sample << " " << c.body;
        EXPECT_GT(drawn[0].size(), 20u) << c.sample << " " << c.body;
    }
}

}  // namespace
