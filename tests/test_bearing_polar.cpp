// The bearing load in a body's own frame over the cycle (the polar diagram):
// every point against the results' reaction turned into the body's axes,
// checked through quantities no frame changes (dot and cross products with a
// line fixed in the body); the frame's side is the global reaction; the two
// bodies of a pin get opposite loads; the peak is the summary's; the sector
// the load sweeps on two cases worked by hand; the drawing, its exports and
// the command line; the desktop view.
#include "app/cli_render_commands.h"
#include "core/file/mechanism_file.h"
#include "core/results/bearing_polar.h"
#include "core/results/body_points_at_step.h"
#include "core/results/free_body.h"
#include "render/bearing_polar_diagram.h"
#include "render/palette.h"
#include "render/review_report.h"
#include "tests/mechanism_builders.h"
#include "tests/recording_device.h"
#include "tests/solved_mechanism.h"
#include "ui/analysis/analysis_state.h"
#include "ui/document/mechanism_document.h"
#include "ui/results/bearing_polar_view.h"

#include <QApplication>
#include <QComboBox>
#include <QCoreApplication>
#include <QFile>
#include <QImage>
#include <QPainter>
#include <QProcess>
#include <QRegularExpression>
#include <QStandardPaths>
#include <QSvgRenderer>
#include <QTemporaryDir>

#include <gtest/gtest.h>

#include <Eigen/Geometry>

#include <cmath>
#include <filesystem>
#include <set>
#include <tuple>

using namespace clevis;

namespace {

const std::string kPress = std::string(CLEVIS_SAMPLES_DIR) + "/punch_press.json";
const std::string kSixBar = std::string(CLEVIS_SAMPLES_DIR) + "/dwell_six_bar.json";

test::Solved solveSample(const std::string& path) { return test::solve(loadMechanismFile(path).mechanism); }

int jointIndex(const CompiledMechanism& m, const std::string& name)
{
    for (std::size_t j = 0; j < m.joints.size(); ++j)
        if (m.joints[j].name == name) return int(j);
    throw std::runtime_error("no joint " + name);
}

// The local offsets (from the centre of mass, body frame) of the body's first
// two joints in document order: a line fixed in the body.
Vec2 lineInBody(const CompiledMechanism& m, int body)
{
    std::vector<Vec2> local;
    for (const auto& j : m.joints)
        for (int side = 0; side < 2; ++side)
            if (j.body[side] == body && local.size() < 2) local.push_back(j.point[side].local);
    return local.at(1) - local.at(0);
}

// The same line where the step puts it (bodyPointsAt lists the joints first, in document order).
Vec2 lineAtStep(const CompiledMechanism& m, const StepResult& step, int body)
{
    const auto points = bodyPointsAt(m, step, body);
    return points.at(1).at - points.at(0).at;
}

// Every point of the curve, on every moving body of two samples: a rotation
// keeps the dot and cross products of two vectors, so the force in the body's
// frame makes with a line fixed in the body the products the global reaction
// makes with that line where the step has put it.
TEST(BearingPolar, EachPointIsTheReactionSeenFromTheBody)
{
    for (const std::string& path : {kPress, kSixBar}) {
        const auto s = solveSample(path);
        int checked = 0;
        for (std::size_t j = 0; j < s.m.joints.size(); ++j)
            for (int side = 0; side < 2; ++side) {
                const int body = s.m.joints[j].body[side];
                if (body == kGround) continue;
                const Vec2 local = lineInBody(s.m, body);
                if (local.norm() < 1e-6) continue;  // two joints at one point: no line
                const BearingPolar polar = bearingPolar(s.m, s.r, s.s, int(j), body);
                ASSERT_EQ(polar.force.size(), s.r.steps.size());
                const double scale = std::max(1.0, s.s.joints[j].peak.value) * local.norm();
                for (std::size_t i = 0; i < s.r.steps.size(); ++i) {
                    // The second body receives the reaction, the first its opposite (results.h).
                    const Vec2 global = (side == 1 ? 1.0 : -1.0) * s.r.steps[i].joints[j].force;
                    const Vec2 line = lineAtStep(s.m, s.r.steps[i], body);
                    ASSERT_NEAR(polar.force[i].dot(local), global.dot(line), 1e-9 * scale) << path << " step " << i;
                    ASSERT_NEAR(cross(local, polar.force[i]), cross(line, global), 1e-9 * scale);
                }
                ++checked;
            }
        EXPECT_GE(checked, 3) << path;
    }
}

// The rotation written from its definition, Rot(−φ) with φ from the results' q.
TEST(BearingPolar, RotatedBackByTheBodyAngle)
{
    const auto s = solveSample(kPress);
    const int j = jointIndex(s.m, "crank_pin"), rod = findBody(s.m, "connecting_rod");
    const BearingPolar polar = bearingPolar(s.m, s.r, s.s, j, rod);
    for (std::size_t i = 0; i < s.r.steps.size(); i += 7) {
        const double phi = s.r.steps[i].q(3 * rod + 2);
        const Vec2 expected = Eigen::Rotation2Dd(-phi) * s.r.steps[i].joints[j].force;
        EXPECT_NEAR((polar.force[i] - expected).norm(), 0.0, 1e-9 * s.s.joints[j].peak.value);
    }
}

TEST(BearingPolar, TheFrameSeesTheGlobalReactionReversed)
{
    const auto s = solveSample(kPress);
    const int j = jointIndex(s.m, "main_bearing");
    ASSERT_EQ(s.m.joints[j].body[0], kGround);
    const BearingPolar polar = bearingPolar(s.m, s.r, s.s, j, kGround);
    EXPECT_EQ(polar.other, findBody(s.m, "crankshaft"));
    for (std::size_t i = 0; i < s.r.steps.size(); ++i)
        EXPECT_EQ(polar.force[i], Vec2(-s.r.steps[i].joints[j].force)) << "step " << i;
}

// Equal and opposite: the two bodies' loads, each turned back into global axes.
TEST(BearingPolar, TheTwoBodiesOfAPinGetOppositeLoads)
{
    const auto s = solveSample(kPress);
    const int j = jointIndex(s.m, "crank_pin");
    const int crank = s.m.joints[j].body[0], rod = s.m.joints[j].body[1];
    const BearingPolar onCrank = bearingPolar(s.m, s.r, s.s, j, crank), onRod = bearingPolar(s.m, s.r, s.s, j, rod);
    EXPECT_EQ(onCrank.other, rod);
    EXPECT_EQ(onRod.other, crank);
    for (std::size_t i = 0; i < s.r.steps.size(); ++i) {
        const auto& q = s.r.steps[i].q;
        const Vec2 crankGlobal = Eigen::Rotation2Dd(q(3 * crank + 2)) * onCrank.force[i];
        const Vec2 rodGlobal = Eigen::Rotation2Dd(q(3 * rod + 2)) * onRod.force[i];
        EXPECT_NEAR((crankGlobal + rodGlobal).norm(), 0.0, 1e-9 * s.s.joints[j].peak.value);
        EXPECT_NEAR((rodGlobal - s.r.steps[i].joints[j].force).norm(), 0.0, 1e-9 * s.s.joints[j].peak.value);
    }
}

TEST(BearingPolar, NotABodyOfTheJointIsRefused)
{
    const auto s = solveSample(kPress);
    EXPECT_THROW(bearingPolar(s.m, s.r, s.s, jointIndex(s.m, "crank_pin"), findBody(s.m, "ram")),
                 std::invalid_argument);
}

// The peak of |F'| over the reliable steps, found here by a plain search, is
// the summary's peak of the joint, on every side of every joint.
TEST(BearingPolar, PeakIsTheSummarysPeak)
{
    for (const std::string& path : {kPress, kSixBar}) {
        const auto s = solveSample(path);
        for (std::size_t j = 0; j < s.m.joints.size(); ++j)
            for (const int body : s.m.joints[j].body) {
                const BearingPolar polar = bearingPolar(s.m, s.r, s.s, int(j), body);
                double largest = 0;
                int at = -1;
                for (std::size_t i = 0; i < polar.force.size(); ++i)
                    if (!s.s.unreliable[i] && polar.force[i].norm() > largest + 1e-9 * largest)
                        largest = polar.force[i].norm(), at = int(i);
                EXPECT_NEAR(polar.peak.value, largest, 1e-9 * largest) << s.m.joints[j].name;
                EXPECT_NEAR(polar.force[at].norm(), polar.force[polar.peak.step].norm(), 1e-9 * largest);
                EXPECT_EQ(polar.peak.value, s.s.joints[j].peak.value);
                EXPECT_EQ(polar.peak.step, s.s.joints[j].peak.step);
            }
    }
}

// A massless link turning once at constant speed on a ground pin, a fixed
// load P hung on its tip: the pin holds −P whatever the angle, so in the
// link's own frame the load turns a full revolution backwards, one step's
// angle 360°/N between neighbours. By hand: the largest gap is one step,
// the sector 360° − 360°/N, and the load reverses. The frame sees −P at
// every step: a sector of 0°, the direction it never comes from opposite.
TEST(BearingPolar, ALinkSpinningUnderAFixedLoadIsLoadedAllRound)
{
    constexpr int kSteps = 36;
    Mechanism doc;
    doc.gravity = Vec2::Zero();
    doc.bodies = {test::pointBody("link", 0.0, Vec2(0.1, 0.0), 0.0)};
    doc.joints = {test::pin("O", kGroundName, "link", Vec2::Zero())};
    doc.drivers = {test::rotary("motor", "O", ConstantSpeed{2 * kPi, 0.0})};
    doc.loads = {ForceLoad{"P", {"link", Vec2(0.2, 0.0)}, Vec2(0.0, -150.0), false, std::nullopt}};
    doc.cycle.steps = kSteps;
    doc.cycle.duration = 1.0;
    const auto s = test::solve(doc);
    ASSERT_TRUE(s.r.complete);
    ASSERT_EQ(s.s.nearSingularSteps, 0);

    const BearingPolar onLink = bearingPolar(s.m, s.r, s.s, 0, 0);
    ASSERT_TRUE(onLink.sector.defined);
    EXPECT_EQ(onLink.sector.counted, kSteps + 1);
    EXPECT_NEAR(onLink.sector.spanDeg, 360.0 - 360.0 / kSteps, 1e-6);
    EXPECT_TRUE(onLink.sector.reverses);
    for (std::size_t i = 0; i < onLink.force.size(); ++i) EXPECT_NEAR(onLink.force[i].norm(), 150.0, 1e-6);

    const BearingPolar onFrame = bearingPolar(s.m, s.r, s.s, 0, kGround);
    EXPECT_NEAR(onFrame.sector.spanDeg, 0.0, 1e-6);
    EXPECT_FALSE(onFrame.sector.reverses);
    EXPECT_NEAR(onFrame.sector.quietDeg, 90.0, 1e-6);  // the link pulls the frame down (−90°): never from above
}

// A bar with mass spinning steadily, nothing else on it: the pin pulls its
// centre of mass towards the pivot (m·ω²·r, the centripetal force), a
// direction fixed in the bar. Drawn along +x from the pivot, the load is at
// 180° in the bar's frame at every step: a sector of 0°, quiet towards 0°.
TEST(BearingPolar, ASpinningBarIsLoadedFromOneSide)
{
    constexpr double kMass = 2.0, kRadius = 0.15, kOmega = 2 * kPi;
    Mechanism doc;
    doc.gravity = Vec2::Zero();
    doc.bodies = {test::pointBody("bar", kMass, Vec2(kRadius, 0.0), 0.01)};
    doc.joints = {test::pin("O", kGroundName, "bar", Vec2::Zero())};
    doc.drivers = {test::rotary("motor", "O", ConstantSpeed{kOmega, 0.0})};
    doc.cycle.steps = 24;
    doc.cycle.duration = 1.0;
    const auto s = test::solve(doc);
    const BearingPolar polar = bearingPolar(s.m, s.r, s.s, 0, 0);
    for (const Vec2& f : polar.force) {
        EXPECT_NEAR(f.x(), -kMass * kOmega * kOmega * kRadius, 1e-6);
        EXPECT_NEAR(f.y(), 0.0, 1e-6);
    }
    EXPECT_NEAR(polar.sector.spanDeg, 0.0, 1e-6);
    EXPECT_FALSE(polar.sector.reverses);
    EXPECT_NEAR(polar.sector.quietDeg, 0.0, 1e-6);
}

// Directions at 10°, 50° and 100° (and a load under the floor at 250°): the
// largest gap runs from 100° round to 10° (270°), so the sector is 90° and
// the quiet middle 100° + 135° = 235°, i.e. −125°.
TEST(BearingPolar, SectorOfAFewDirectionsByHand)
{
    const auto at = [](double deg, double size) {
        return Vec2(size * std::cos(degToRad(deg)), size * std::sin(degToRad(deg)));
    };
    const LoadSector s = loadSector({at(50, 2), at(10, 3), at(100, 1), at(250, 0.001)}, 0.01);
    EXPECT_EQ(s.counted, 3);
    EXPECT_NEAR(s.spanDeg, 90.0, 1e-9);
    EXPECT_NEAR(s.quietDeg, -125.0, 1e-9);
    EXPECT_FALSE(s.reverses);
    const LoadSector opposite = loadSector({at(0, 1), at(180, 1)}, 0.0);
    EXPECT_NEAR(opposite.spanDeg, 180.0, 1e-9);
    EXPECT_TRUE(opposite.reverses);
    EXPECT_FALSE(loadSector({at(30, 0.001)}, 0.01).defined);
}

// Marks where the axis passes whole multiples of the interval, on the
// straight pieces between steps: axis 0, 25, 50, 75 with forces along x of
// 0, 10, 20, 30 N puts a mark at 0 (the step) and at 30 (a fifth of the way
// from 25 to 50: 12 N) and 60 (24 N).
TEST(BearingPolar, MarksLieOnTheDrawnCurve)
{
    const std::vector<Vec2> force{Vec2(0, 0), Vec2(10, 0), Vec2(20, 0), Vec2(30, 0)};
    const auto marks = polarMarks(force, {0, 25, 50, 75}, 30);
    ASSERT_EQ(marks.size(), 3u);
    EXPECT_DOUBLE_EQ(marks[0].position, 0);
    EXPECT_NEAR(marks[1].force.x(), 12.0, 1e-12);
    EXPECT_NEAR(marks[2].force.x(), 24.0, 1e-12);
    const auto falling = polarMarks(force, {75, 50, 25, 0}, 30);  // a falling axis keeps the cycle's order
    ASSERT_EQ(falling.size(), 3u);
    EXPECT_DOUBLE_EQ(falling[0].position, 60);
    EXPECT_NEAR(falling[0].force.x(), 6.0, 1e-12);
}

// What the diagram draws, recorded at its own size.
struct Drawn {
    std::vector<test::RecordedText> texts;
    std::vector<test::RecordedLine> lines;
};
Drawn recorded(const ui::Figure& figure)
{
    test::RecordingDevice device(figure.size().toSize() + QSize(1, 1));
    QPainter p(&device);
    figure.paint(p, QRectF(QPointF(0, 0), figure.size()));
    p.end();
    return {device.engine.texts, device.engine.lines};
}

bool drawsText(const Drawn& e, const QString& text)
{
    return std::any_of(e.texts.begin(), e.texts.end(), [&](const auto& t) { return t.text.contains(text); });
}

// The mark positions named in the diagram, alone ("120°") or in a shared
// label's runs ("0°–90°, 180°–330°", 30° apart), and how many shared labels;
// a position named twice fails.
std::pair<std::set<int>, int> namedMarks(const Drawn& e)
{
    std::set<int> named;
    int shared = 0;
    static const QRegularExpression one(R"(^(\d+)°$)"), run(R"((\d+)°(?:–(\d+)°)?)");
    for (const auto& t : e.texts) {
        if (const auto m = one.match(t.text); m.hasMatch()) {
            EXPECT_TRUE(named.insert(m.captured(1).toInt()).second) << "named twice: " << t.text.toStdString();
        } else if (t.text.contains("°–")) {
            ++shared;
            for (auto it = run.globalMatch(t.text); it.hasNext();) {
                const auto m = it.next();
                const int first = m.captured(1).toInt(), last = m.captured(2).isEmpty() ? first : m.captured(2).toInt();
                for (int a = first; a <= last; a += 30) EXPECT_TRUE(named.insert(a).second) << a;
            }
        }
    }
    return {named, shared};
}

// No two texts of the diagram overlap, for every side of every joint of two
// samples, with and without the scrubbed position pointed out, and as the
// window draws it (the plot alone, its labels large against it).
TEST(BearingPolarDiagram, NoTwoTextsOverlap)
{
    for (const std::string& path : {kPress, kSixBar}) {
        const auto s = solveSample(path);
        for (std::size_t j = 0; j < s.m.joints.size(); ++j)
            for (const int body : s.m.joints[j].body)
                for (const auto& [now, plotOnly, textScale] :
                     {std::tuple{-1, false, 1.0}, {100, false, 1.0}, {100, true, 1.8}, {100, true, 2.2}}) {
                    const ui::BearingPolarDiagram figure(s.m, s.r, bearingPolar(s.m, s.r, s.s, int(j), body),
                                                         {ui::RenderUnits{}, now, plotOnly, textScale, textScale > 2});
                    const auto texts = recorded(figure).texts;
                    ASSERT_GT(texts.size(), 4u);
                    for (std::size_t a = 0; a < texts.size(); ++a)
                        for (std::size_t b = a + 1; b < texts.size(); ++b) {
                            const QRectF overlap = texts[a].box.intersected(texts[b].box);
                            EXPECT_FALSE(overlap.width() > 0.5 && overlap.height() > 0.5)
                                << path << " " << s.m.joints[j].name << " on " << s.m.bodyName(body) << ": \""
                                << texts[a].text.toStdString() << "\" and \"" << texts[b].text.toStdString() << "\"";
                        }
                }
    }
}

// The labels: the peak with the summary's value, the axes named after the
// body, a mark every 30° of the crank (0° to 330°: the 360° mark is the 0° one
// again), and the rings, the outer one at or past the peak.
TEST(BearingPolarDiagram, LabelsThePeakTheAxesTheMarksAndTheRings)
{
    const auto s = solveSample(kPress);
    const int j = jointIndex(s.m, "crank_pin"), rod = findBody(s.m, "connecting_rod");
    const ui::BearingPolarDiagram figure(s.m, s.r, bearingPolar(s.m, s.r, s.s, j, rod), {ui::RenderUnits{}});
    const auto e = recorded(figure);
    const ui::RenderUnits u;
    EXPECT_TRUE(drawsText(e, "peak " + u.force(s.s.joints[j].peak.value)));
    EXPECT_TRUE(drawsText(e, "x (connecting_rod)"));
    EXPECT_TRUE(drawsText(e, "y (connecting_rod)"));
    EXPECT_TRUE(drawsText(e, "Bearing load at crank_pin"));  // the title, wrapped
    EXPECT_DOUBLE_EQ(figure.markInterval(), 30.0);
    ASSERT_EQ(figure.marks().size(), 12u);
    EXPECT_EQ(namedMarks(e).first.size(), 12u) << "every mark named, alone or in a shared label";
    ASSERT_FALSE(figure.rings().empty());
    EXPECT_GE(figure.rings().back(), s.s.joints[j].peak.value);
    EXPECT_LT(figure.rings().back() - figure.rings().front(), s.s.joints[j].peak.value);
}

// A pin carrying almost nothing for most of the cycle (the press's wrist pin
// between strokes) has most marks bunched at the pin: named one by one, a
// dozen names would crowd round a few points. They share one label, their
// positions as runs ("0°–90°, 180°–330°"); the marks away from the pin keep
// their own, and every mark is named once.
TEST(BearingPolarDiagram, MarksBunchedAtThePinShareOneLabel)
{
    const auto s = solveSample(std::string(CLEVIS_SAMPLES_DIR) + "/flywheel_press.json");
    const int j = jointIndex(s.m, "wrist_pin"), ram = findBody(s.m, "ram");
    const ui::BearingPolarDiagram figure(s.m, s.r, bearingPolar(s.m, s.r, s.s, j, ram), {ui::RenderUnits{}});
    ASSERT_EQ(figure.marks().size(), 12u);
    const auto [named, shared] = namedMarks(recorded(figure));
    EXPECT_EQ(shared, 1);
    EXPECT_EQ(named.size(), 12u);
}

TEST(BearingPolarCommand, WritesSvgPdfAndPng)
{
    const auto s = solveSample(kPress);
    QTemporaryDir dir;
    const QString svg = dir.filePath("pin.svg"), pdf = dir.filePath("pin.pdf"), png = dir.filePath("pin.png");
    for (const QString& out : {svg, pdf, png})
        ASSERT_EQ(cli::runDrawCommand({"bearing-polar", kPress, "--joint", "crank_pin", "--out", out.toStdString()}),
                  0);
    EXPECT_TRUE(QSvgRenderer(svg).isValid());
    QFile svgFile(svg);
    ASSERT_TRUE(svgFile.open(QIODevice::ReadOnly));
    const QString text = QString::fromUtf8(svgFile.readAll());
    // The default side is the joint's second body.
    EXPECT_TRUE(text.contains("Bearing load at crank_pin on connecting_rod"));
    EXPECT_TRUE(text.contains("peak " + ui::RenderUnits{}.force(s.s.joints[jointIndex(s.m, "crank_pin")].peak.value)));
    QFile pdfFile(pdf);
    ASSERT_TRUE(pdfFile.open(QIODevice::ReadOnly));
    EXPECT_TRUE(pdfFile.read(5) == "%PDF-");
    EXPECT_GT(pdfFile.size(), 2000);
    const QImage image(png);
    ASSERT_FALSE(image.isNull());
    EXPECT_GT(image.width(), 500);

    const QString frame = dir.filePath("frame.svg");
    ASSERT_EQ(cli::runDrawCommand({"bearing-polar", kPress, "--joint", "main_bearing", "--body", "ground", "--out",
                                   frame.toStdString()}),
              0);
    QFile frameFile(frame);
    ASSERT_TRUE(frameFile.open(QIODevice::ReadOnly));
    EXPECT_TRUE(QString::fromUtf8(frameFile.readAll()).contains("x (global)"));
}

// A cylinder's end named as a joint: drawn on the body there; another body refused.
TEST(BearingPolarCommand, DrawsACylindersEnd)
{
    const std::string bed = std::string(CLEVIS_SAMPLES_DIR) + "/tipping_bed.json";
    QTemporaryDir dir;
    const QString svg = dir.filePath("rod.svg");
    ASSERT_EQ(cli::runDrawCommand({"bearing-polar", bed, "--joint", "lift_cylinder.rod", "--out", svg.toStdString()}),
              0);
    QFile file(svg);
    ASSERT_TRUE(file.open(QIODevice::ReadOnly));
    EXPECT_TRUE(QString::fromUtf8(file.readAll()).contains("Bearing load at lift_cylinder.rod on bed"));
    testing::internal::CaptureStderr();
    EXPECT_EQ(cli::runDrawCommand({"bearing-polar", bed, "--joint", "lift_cylinder.rod", "--body", "ground", "--out",
                                   svg.toStdString()}),
              2);
    const std::string err = testing::internal::GetCapturedStderr();
    EXPECT_NE(err.find("on the body there only, bed"), std::string::npos) << err;
    testing::internal::CaptureStderr();
    EXPECT_EQ(cli::runDrawCommand({"bearing-polar", bed, "--joint", "ram", "--out", svg.toStdString()}), 2);
    const std::string listed = testing::internal::GetCapturedStderr();
    EXPECT_NE(listed.find("hinge, lift_cylinder.cap, lift_cylinder.rod"), std::string::npos) << listed;
}

TEST(BearingPolarCommand, NamesTheJointOrTheBodyThatIsWrong)
{
    const auto fails = [](std::vector<std::string> args, int code, const std::string& named) {
        testing::internal::CaptureStderr();
        args.insert(args.begin(), "bearing-polar");
        EXPECT_EQ(cli::runDrawCommand(args), code);
        const std::string err = testing::internal::GetCapturedStderr();
        EXPECT_NE(err.find(named), std::string::npos) << err;
    };
    fails({kPress, "--joint", "knee", "--out", "/tmp/x.svg"}, 2, "knee");
    fails({kPress, "--joint", "crank_pin", "--body", "ram", "--out", "/tmp/x.svg"}, 2,
          "not a body of joint \"crank_pin\" (its bodies: crankshaft, connecting_rod)");
    fails({kPress, "--joint", "crank_pin", "--body", "flywheel", "--out", "/tmp/x.svg"}, 2, "flywheel");
    fails({kPress, "--out", "/tmp/x.svg"}, 2, "--joint is missing");
    fails({kPress, "--joint", "crank_pin", "--out", "/tmp/x.txt"}, 2, ".svg, .pdf or .png");
    fails({"/nonexistent/press.json", "--joint", "crank_pin", "--out", "/tmp/x.svg"}, 1, "press.json");
}

// The review report's sizing chapter draws every pin's diagram (the press
// has three pins and a slider): each title once, after the chapter's heading.
TEST(BearingPolarReport, TheSizingChapterHasEveryPin)
{
    QTemporaryDir dir;
    const QString pdf = dir.filePath("review.pdf");
    ASSERT_EQ(cli::runDrawCommand({"report", kPress, "--out", pdf.toStdString()}), 0);
    QProcess text;
    text.start("pdftotext", {pdf, "-"});
    ASSERT_TRUE(text.waitForFinished(60000));
    const QString all = QString::fromUtf8(text.readAllStandardOutput()).simplified();
    const qsizetype chapter = all.indexOf("6 Sizing");
    ASSERT_GE(chapter, 0);
    for (const char* pin : {"main_bearing on crankshaft", "crank_pin on connecting_rod", "wrist_pin on ram"})
        EXPECT_EQ(all.count(QString("Bearing load at %1").arg(pin)), 1) << pin;
    EXPECT_GT(all.indexOf("Bearing load at main_bearing"), chapter);
    EXPECT_EQ(all.count("Bearing load at ram_guide"), 0);  // a slider: no bearing
}

// The report tells how far it has got in steps that add up to its total, a
// row of bearing diagrams being one (the press's three pins make two), and
// stops where it is told to, saying so.
TEST(BearingPolarReport, ProgressCountsEveryRowUpToItsTotalAndCanStop)
{
    const auto s = solveSample(kPress);
    QTemporaryDir dir;
    const QString pdf = dir.filePath("review.pdf");
    const ui::ReviewReportInput in{s.m, s.r, s.s, "punch_press.json", ui::RenderUnits{}, &s.doc};
    std::vector<std::pair<int, int>> calls;
    QString error;
    ASSERT_TRUE(ui::writeReviewReport(in, pdf, &error, [&](int done, int total) {
        calls.emplace_back(done, total);
        return true;
    })) << error.toStdString();
    ASSERT_FALSE(calls.empty());
    for (std::size_t k = 0; k < calls.size(); ++k) {
        EXPECT_EQ(calls[k].first, int(k) + 1);
        EXPECT_EQ(calls[k].second, calls.front().second);
    }
    EXPECT_EQ(calls.back().first, calls.back().second) << "every step counted in the total, and no more";

    const int stop = int(calls.size()) / 2;
    int last = 0;
    EXPECT_FALSE(ui::writeReviewReport(in, pdf, &error, [&](int done, int) {
        last = done;
        return done < stop;
    }));
    EXPECT_EQ(last, stop);
    EXPECT_EQ(error, "report: cancelled");
}

// The view in the window, offscreen: a message until a joint is selected;
// then the joint's second body's frame, or its first's when chosen; the
// scrubbed step pointed out by the blue arrow along that step's force; and
// nothing of the old mechanism after another is opened.
// A sample opened in the document and solved, the bearing view beside it.
struct OpenSample {
    explicit OpenSample(const std::string& path)
    {
        doc.reset(loadMechanismFile(path).mechanism,
                  QString::fromStdString(std::filesystem::path(path).filename().string()));
        analysis.waitForIdle();
        QCoreApplication::processEvents();
        view.resize(420, 560);
        view.show();  // a hidden view is worked out only when shown
    }
    ui::MechanismDocument doc;
    ui::AnalysisState analysis{&doc};
    ui::BearingPolarView view{&doc, &analysis};
};

TEST(BearingPolarView, ShowsTheSelectedJointAtTheScrubbedStep)
{
    using namespace clevis::ui;
    OpenSample open(kPress);
    auto& [doc, analysis, view] = open;
    ASSERT_TRUE(analysis.hasResult());
    EXPECT_EQ(view.figure(), nullptr);
    EXPECT_TRUE(view.message().contains("Select a joint")) << view.message().toStdString();

    doc.setSelection({Selection::Kind::Joint, "crank_pin", -1});
    ASSERT_NE(view.figure(), nullptr);
    const int rod = findBody(analysis.compiled(), "connecting_rod");
    EXPECT_EQ(view.figure()->polar().body, rod);
    EXPECT_EQ(view.frameChoice()->count(), 2);
    view.frameChoice()->setCurrentIndex(1);
    ASSERT_NE(view.figure(), nullptr);
    EXPECT_EQ(view.figure()->polar().body, findBody(analysis.compiled(), "crankshaft"));
    view.frameChoice()->setCurrentIndex(0);

    analysis.setCurrentStep(160);  // in the press stroke: a long arrow
    ASSERT_NE(view.figure(), nullptr);
    EXPECT_EQ(view.figure()->options().currentStep, 160);
    const Vec2 now = view.figure()->polar().force[160];
    int arrows = 0;
    for (const auto& line : recorded(*view.figure()).lines)
        if (line.pen.color() == palette::link() && line.pen.widthF() > 1) {  // the arrow's shaft, not a leader
            ++arrows;
            // Page y runs down: the drawn direction is the force's with y turned over.
            const double drawn = std::atan2(-line.line.dy(), line.line.dx());
            EXPECT_NEAR(std::remainder(drawn - std::atan2(now.y(), now.x()), 2 * kPi), 0.0, 1e-6);
        }
    EXPECT_EQ(arrows, 1);
    EXPECT_TRUE(view.notesText().contains("Now (blue arrow): " + ui::RenderUnits{}.force(now.norm())))
        << view.notesText().toStdString();

    doc.setSelection({Selection::Kind::Body, "ram", -1});
    EXPECT_EQ(view.figure(), nullptr);
    EXPECT_TRUE(view.message().contains("Select a joint"));

    doc.setSelection({Selection::Kind::Joint, "crank_pin", -1});
    ASSERT_NE(view.figure(), nullptr);
    doc.reset(loadMechanismFile(kSixBar).mechanism, "dwell_six_bar.json");
    EXPECT_EQ(view.figure(), nullptr);
    EXPECT_EQ(view.frameChoice()->count(), 0);
    analysis.waitForIdle();
    QCoreApplication::processEvents();
    EXPECT_EQ(view.figure(), nullptr);  // nothing selected in the new mechanism
}

// Hidden (behind another tab), the view works nothing out for a new
// selection or result; shown, it is the selection's at the current result.
TEST(BearingPolarView, WorkedOutWhenShownNotWhileHidden)
{
    using namespace clevis::ui;
    OpenSample open(kPress);
    auto& [doc, analysis, view] = open;
    ASSERT_TRUE(analysis.hasResult());
    view.hide();
    doc.setSelection({Selection::Kind::Joint, "crank_pin", -1});
    analysis.setCurrentStep(160);
    EXPECT_EQ(view.figure(), nullptr);
    view.show();
    ASSERT_NE(view.figure(), nullptr);
    EXPECT_EQ(view.figure()->polar().body, findBody(analysis.compiled(), "connecting_rod"));
    EXPECT_EQ(view.figure()->options().currentStep, 160);
}

// A cylinder selected: its rod end on the body there, or its cap end (on the
// frame, global axes) when chosen; a driver at a slider has no ends.
TEST(BearingPolarView, ACylindersEndsOnTheBodiesThere)
{
    using namespace clevis::ui;
    OpenSample open(std::string(CLEVIS_SAMPLES_DIR) + "/tipping_bed.json");
    auto& [doc, analysis, view] = open;
    ASSERT_TRUE(analysis.hasResult());
    doc.setSelection({Selection::Kind::Driver, "lift_cylinder", -1});
    ASSERT_NE(view.figure(), nullptr) << view.message().toStdString();
    EXPECT_EQ(view.figure()->polar().pin, "lift_cylinder.rod");
    EXPECT_EQ(view.figure()->polar().body, findBody(analysis.compiled(), "bed"));
    ASSERT_EQ(view.frameChoice()->count(), 2);
    EXPECT_TRUE(view.frameChoice()->itemText(0).contains("Rod end")) << view.frameChoice()->itemText(0).toStdString();
    view.frameChoice()->setCurrentIndex(1);
    ASSERT_NE(view.figure(), nullptr);
    EXPECT_EQ(view.figure()->polar().pin, "lift_cylinder.cap");
    EXPECT_EQ(view.figure()->polar().body, kGround);
    EXPECT_TRUE(view.notesText().contains("Bearing load at lift_cylinder.cap on ground"))
        << view.notesText().toStdString();

    doc.reset(loadMechanismFile(kPress).mechanism, "punch_press.json");
    analysis.waitForIdle();
    QCoreApplication::processEvents();
    doc.setSelection({Selection::Kind::Driver, QString::fromStdString(analysis.compiled().drivers[0].name), -1});
    EXPECT_EQ(view.figure(), nullptr);
    EXPECT_TRUE(view.message().contains("cylinder")) << view.message().toStdString();
}

// The report lists a cylinder's ends with the joints and draws their bearing loads.
TEST(BearingPolarReport, ACylindersEndsAreInTheLoadsAndTheSizingChapter)
{
    QTemporaryDir dir;
    const QString pdf = dir.filePath("review.pdf");
    const std::string bed = std::string(CLEVIS_SAMPLES_DIR) + "/tipping_bed.json";
    ASSERT_EQ(cli::runDrawCommand({"report", bed, "--out", pdf.toStdString()}), 0);
    QProcess text;
    text.start("pdftotext", {pdf, "-"});
    ASSERT_TRUE(text.waitForFinished(60000));
    const QString all = QString::fromUtf8(text.readAllStandardOutput()).simplified();
    const qsizetype loads = all.indexOf("4 Peak loads"), sizing = all.indexOf("6 Sizing");
    ASSERT_GE(loads, 0);
    ASSERT_GT(sizing, loads);
    for (const char* end : {"lift_cylinder.cap", "lift_cylinder.rod"}) {
        const qsizetype row = all.indexOf(end, loads);
        EXPECT_TRUE(row > loads && row < sizing) << end << " in the joints' peak table";
    }
    EXPECT_EQ(all.count("Bearing load at lift_cylinder.rod on bed"), 1);
    EXPECT_EQ(all.count("Bearing load at lift_cylinder.cap on ground"), 1);
    EXPECT_GT(all.indexOf("Bearing load at lift_cylinder.rod"), sizing);
}

}  // namespace

// The desktop view needs a QApplication; offscreen, so the tests run (and are listed) without a display.
int main(int argc, char** argv)
{
    qputenv("QT_QPA_PLATFORM", "offscreen");
    QStandardPaths::setTestModeEnabled(true);  // the user's remembered units stay out of the tests
    QApplication app(argc, argv);
    ::testing::InitGoogleTest(&argc, argv);
    return RUN_ALL_TESTS();
}
