// The N/V/M diagram of a bar: the band its loads sweep over the cycle (against
// an independent loop over every step), the drawing's peak labels (against
// what `clevis-cli internal-loads` prints), its layout (no two texts
// overlap), `clevis-cli bar-diagram` (valid SVG/PDF/PNG, its refusals) and
// the desktop view (the selected bar's figures, cleared on New).
#include "core/file/mechanism_file.h"
#include "core/results/bar_envelope_band.h"
#include "core/results/cycle_summary.h"
#include "core/solver/body_state.h"
#include "core/solver/exact_position.h"
#include "render/bar_load_diagram.h"
#include "tests/cli_runner.h"
#include "tests/recording_device.h"
#include "tests/solved_mechanism.h"
#include "ui/analysis/analysis_state.h"
#include "ui/document/mechanism_document.h"
#include "ui/document/mechanism_edits.h"
#include "ui/files/file_actions.h"
#include "ui/results/bar_load_view.h"
#include "ui/shell/main_window.h"

#include <QAction>
#include <QCoreApplication>
#include <QDockWidget>
#include <QImage>
#include <QPainter>
#include <QTemporaryDir>
#include <QXmlStreamReader>

#include <gtest/gtest.h>
#include <nlohmann/json.hpp>

#include <unistd.h>
#include <algorithm>
#include <cmath>
#include <filesystem>

using namespace clevis;
using namespace clevis::test;

namespace {

const std::string kSamples = CLEVIS_SAMPLES_DIR;
const std::string kSixBar = kSamples + "/dwell_six_bar.json";

Solved solveSample(const std::string& name) { return solve(loadMechanismFile(kSamples + "/" + name).mechanism); }

double component(const BarStation& s, int which) { return which == 0 ? s.axial : which == 1 ? s.shear : s.moment; }

// ---- The band ------------------------------------------------------------

// Brute force: at each of the band's stations, BarLoads::at at every step,
// the largest and smallest kept. At a piece end (a station listed on both
// sides) the value just before or beyond is taken a hair's breadth away from
// it, so this loop needs no rule for where each step's load sits.
void expectBandIsRangeOverSteps(const Solved& s, const BarModel& bar)
{
    const auto band = barEnvelopeBand(s.m, s.r, bar, 21);
    ASSERT_GE(band.size(), 21u);
    const double L = bar.length, hair = 1e-10 * L;
    std::vector<bool> paired(band.size(), false);
    for (std::size_t i = 0; i + 1 < band.size(); ++i)
        if (band[i].s == band[i + 1].s) paired[i] = paired[i + 1] = true;
    for (std::size_t i = 0; i + 1 < band.size(); ++i) EXPECT_LE(band[i].s, band[i + 1].s) << bar.bodyName;
    EXPECT_EQ(band.front().s, 0.0);
    EXPECT_EQ(band.back().s, L);

    std::vector<BarStation> most(band.size()), least(band.size());
    std::vector<std::vector<BodyLoad>> loads;
    BarLoads along;
    for (std::size_t k = 0; k < s.r.steps.size(); ++k) {
        const Pose q(s.r.steps[k].q);
        bodyLoads(s.m, s.r.steps[k], q, loads);
        along.set(s.m, bar, s.r.steps[k], q, loads[std::size_t(bar.body)]);
        for (std::size_t i = 0; i < band.size(); ++i) {
            const double x = !paired[i] ? band[i].s : band[i].before ? band[i].s - hair : band[i].s + hair;
            const BarStation v = along.at(x, false);
            for (int c = 0; c < 3; ++c) {
                double& hi = c == 0 ? most[i].axial : c == 1 ? most[i].shear : most[i].moment;
                double& lo = c == 0 ? least[i].axial : c == 1 ? least[i].shear : least[i].moment;
                hi = k == 0 ? component(v, c) : std::max(hi, component(v, c));
                lo = k == 0 ? component(v, c) : std::min(lo, component(v, c));
            }
        }
    }
    for (int c = 0; c < 3; ++c) {
        double scale = 1e-9;
        for (std::size_t i = 0; i < band.size(); ++i)
            scale = std::max({scale, std::abs(component(most[i], c)), std::abs(component(least[i], c))});
        for (std::size_t i = 0; i < band.size(); ++i) {
            EXPECT_NEAR(component(band[i].most, c), component(most[i], c), 1e-7 * scale)
                << bar.bodyName << " component " << c << " at s = " << band[i].s << (band[i].before ? " before" : "");
            EXPECT_NEAR(component(band[i].least, c), component(least[i], c), 1e-7 * scale)
                << bar.bodyName << " component " << c << " at s = " << band[i].s << (band[i].before ? " before" : "");
        }
    }
}

TEST(BarEnvelopeBand, IsTheRangeOfEveryStepAtEachStationOnEverySample)
{
    for (const char* sample : {"dwell_six_bar.json", "flap_folder.json", "punch_press.json", "tote_arm.json"}) {
        SCOPED_TRACE(sample);
        const Solved s = solveSample(sample);
        ASSERT_FALSE(s.bars.bars.empty());
        for (const BarModel& bar : s.bars.bars) expectBandIsRangeOverSteps(s, bar);
    }
}

// The report finds the bands of all bars in one pass over the cycle: each
// the band of that bar alone, bit for bit, on samples whose bars differ in
// length, loads part-way along and point masses.
TEST(BarEnvelopeBand, AllBarsInOnePassAreEachBarsOwn)
{
    for (const char* sample : {"dwell_six_bar.json", "flap_folder.json", "punch_press.json", "tote_arm.json"}) {
        SCOPED_TRACE(sample);
        const Solved s = solveSample(sample);
        ASSERT_GE(s.bars.bars.size(), 2u);
        const auto together = barEnvelopeBands(s.m, s.r, s.bars.bars, 21);
        ASSERT_EQ(together.size(), s.bars.bars.size());
        for (std::size_t b = 0; b < s.bars.bars.size(); ++b) {
            const auto alone = barEnvelopeBand(s.m, s.r, s.bars.bars[b], 21);
            ASSERT_EQ(together[b].size(), alone.size()) << s.bars.bars[b].bodyName;
            for (std::size_t i = 0; i < alone.size(); ++i) {
                const BandStation &x = together[b][i], &y = alone[i];
                EXPECT_TRUE(x.s == y.s && x.before == y.before) << s.bars.bars[b].bodyName << " station " << i;
                for (int c = 0; c < 3; ++c) {
                    EXPECT_EQ(component(x.most, c), component(y.most, c)) << s.bars.bars[b].bodyName << " " << i;
                    EXPECT_EQ(component(x.least, c), component(y.least, c)) << s.bars.bars[b].bodyName << " " << i;
                }
            }
        }
    }
}

// A joint part-way along a bar (the six-bar's finger lever carries D inside
// its section): the band lists that station on both sides, and the two sides
// differ by the joint's force somewhere in the cycle.
TEST(BarEnvelopeBand, TakesBothSidesOfALoadPartWayAlong)
{
    const Solved s = solveSample("dwell_six_bar.json");
    const BarModel& bar = s.bars.bars[barIndex(s, "finger_lever")];
    const auto band = barEnvelopeBand(s.m, s.r, bar, 5);
    int inside = 0;
    for (std::size_t i = 0; i + 1 < band.size(); ++i)
        if (band[i].s == band[i + 1].s && band[i].s > 0 && band[i].s < bar.length) {
            ++inside;
            EXPECT_TRUE(band[i].before);
            EXPECT_FALSE(band[i + 1].before);
            EXPECT_GT(std::abs(band[i].most.shear - band[i + 1].most.shear), 1.0);
        }
    EXPECT_EQ(inside, 1);
    EXPECT_THROW(barEnvelopeBand(s.m, s.r, bar, 1), std::invalid_argument);
}

// ---- The drawing ---------------------------------------------------------

std::vector<RecordedText> textsOf(const ui::Figure& figure)
{
    RecordingDevice device(figure.size().toSize() + QSize(1, 1));
    QPainter p(&device);
    figure.paint(p, QRectF(QPointF(0, 0), figure.size()));
    p.end();
    return device.engine.texts;
}

// The text drawn right after the one reading `label` (a row's next cell).
QString after(const std::vector<RecordedText>& texts, const QString& label, int skip = 1)
{
    for (std::size_t i = 0; i + skip < texts.size(); ++i)
        if (texts[i].text == label) return texts[i + skip].text;
    ADD_FAILURE() << "no text " << label.toStdString();
    return {};
}

double leadingNumber(const QString& text) { return text.section(' ', 0, 0).toDouble(); }

class CliScratch : public ::testing::Test {
protected:
    void SetUp() override
    {
        scratch = std::filesystem::temp_directory_path() / ("clevis_bar_diagram_" + std::to_string(::getpid()));
        std::filesystem::create_directories(scratch);
    }
    void TearDown() override { std::filesystem::remove_all(scratch); }
    CliRun run(const std::string& args) { return runCli(scratch, args); }
    std::filesystem::path scratch;
};

// The rocker at the position where joint B peaks: the cycle's peaks drawn
// must read as internal-loads writes them (the same exact envelope), and the
// step's peaks must be the largest of its stations (2001 of them, so that
// sampling loses less than the labels' four figures show).
TEST_F(CliScratch, PeakLabelsAreTheInternalLoadsFigures)
{
    const auto out = scratch / "rocker.json";
    const CliRun r =
        run("internal-loads '" + kSixBar + "' --body rocker --at-peak B --stations 2001 --json " + quoted(out));
    ASSERT_EQ(r.exitCode, 0) << r.err;
    const auto j = nlohmann::json::parse(readFile(out));

    const Solved s = solveSample("dwell_six_bar.json");
    int step = -1;
    for (const auto& joint : s.s.joints)
        if (joint.name == "B") step = joint.peak.step;
    ASSERT_GE(step, 0);
    ASSERT_NEAR(s.r.steps[std::size_t(step)].t, j["t"].get<double>(), 1e-15);
    const ui::RenderUnits u;
    const auto cycle = ui::barCycleLoads(s.m, s.r, s.bars.bars[barIndex(s, "rocker")]);
    const auto texts = textsOf(ui::BarLoadDiagram(s.m, s.r, cycle, step, u));

    const auto& env = j["envelope"];
    const auto expectCycle = [&](const QString& row, const nlohmann::json& peak, const char* key, const QString& unit) {
        const QString expected =
            QString("%1 at s = %2, index_motor = %3°")
                .arg(ui::formatQuantity(peak[key].get<double>(), unit), u.length(peak["s_m"].get<double>()))
                .arg(peak["drive"]["index_motor"]["position"].get<double>(), 0, 'f', 2);
        EXPECT_EQ(after(texts, row, 2), expected) << row.toStdString();
    };
    expectCycle("tension", env["tension"], "axial_N", "N");
    expectCycle("compression", env["compression"], "axial_N", "N");
    expectCycle("largest |V|", env["shear"], "shear_N", "N");
    expectCycle("largest |M|", env["moment"], "moment_Nm", "N·m");

    double tension = 0, compression = 0, shear = 0, moment = 0;
    for (const auto& st : j["stations"]) {
        tension = std::max(tension, st["axial_N"].get<double>());
        compression = std::min(compression, st["axial_N"].get<double>());
        if (std::abs(st["shear_N"].get<double>()) > std::abs(shear)) shear = st["shear_N"].get<double>();
        if (std::abs(st["moment_Nm"].get<double>()) > std::abs(moment)) moment = st["moment_Nm"].get<double>();
    }
    const auto expectHere = [&](const QString& row, double sampled) {
        const QString text = after(texts, row);
        if (sampled == 0.0) {
            EXPECT_EQ(text, "none") << row.toStdString();
            return;
        }
        const double drawn = leadingNumber(text);
        EXPECT_NEAR(drawn, sampled, 1e-3 * std::abs(sampled)) << row.toStdString() << ": " << text.toStdString();
        EXPECT_GE(std::abs(drawn) * (1 + 5e-4), std::abs(sampled)) << "the exact peak is at least the sampled one";
    };
    expectHere("tension", tension);
    expectHere("compression", compression);
    expectHere("largest |V|", shear);
    expectHere("largest |M|", moment);

    const QString caption =
        QString("At index_motor = %1°").arg(j["drive"]["index_motor"]["position"].get<double>(), 0, 'f', 2);
    EXPECT_TRUE(std::any_of(texts.begin(), texts.end(), [&](const RecordedText& t) {
        return t.text.startsWith(caption);
    })) << caption.toStdString();
}

void expectNoOverlaps(const std::vector<RecordedText>& texts, const QSizeF& size, const std::string& what)
{
    ASSERT_GT(texts.size(), 20u) << what;
    for (std::size_t a = 0; a < texts.size(); ++a) {
        const QRectF box = texts[a].box;
        EXPECT_TRUE(QRectF(QPointF(-0.5, -0.5), size + QSizeF(1, 1)).contains(box))
            << what << ": \"" << texts[a].text.toStdString() << "\" leaves the figure";
        for (std::size_t b = a + 1; b < texts.size(); ++b) {
            // Boxes run from ascent to descent: neighbouring rows may touch, not cross.
            const QRectF overlap = box.intersected(texts[b].box);
            EXPECT_FALSE(overlap.width() > 0.5 && overlap.height() > 0.5)
                << what << ": \"" << texts[a].text.toStdString() << "\" overlaps \"" << texts[b].text.toStdString()
                << "\"";
        }
    }
}

TEST(BarLoadDiagram, NoTwoTextsOverlapAtAnyWidth)
{
    for (const char* sample : {"dwell_six_bar.json", "punch_press.json", "tote_arm.json", "flap_folder.json"}) {
        const Solved s = solveSample(sample);
        for (const BarModel& bar : s.bars.bars) {
            const auto cycle = ui::barCycleLoads(s.m, s.r, bar);
            for (const double width : {560.0, 420.0, 300.0})
                for (const int step : {0, int(s.r.steps.size()) / 3}) {
                    const ui::BarLoadDiagram figure(s.m, s.r, cycle, step, {}, width);
                    expectNoOverlaps(textsOf(figure), figure.size(),
                                     std::string(sample) + " " + bar.bodyName + " width " + std::to_string(width));
                }
        }
    }
}

// At the widths the report and the desktop draw it, every peak's text is
// whole: a two-motor arm's positions put the table's columns one under the
// other rather than cut them short.
TEST(BarLoadDiagram, EveryPeaksTextIsWholeAtTheUsualWidths)
{
    for (const char* sample : {"dwell_six_bar.json", "punch_press.json", "tote_arm.json", "flap_folder.json"}) {
        const Solved s = solveSample(sample);
        for (const BarModel& bar : s.bars.bars) {
            const auto cycle = ui::barCycleLoads(s.m, s.r, bar);
            for (const double width : {560.0, 515.0, 420.0})
                for (const int step : {0, int(s.r.steps.size()) / 3})
                    for (const RecordedText& t : textsOf(ui::BarLoadDiagram(s.m, s.r, cycle, step, {}, width)))
                        EXPECT_FALSE(t.text.contains(QChar(0x2026)))
                            << sample << " " << bar.bodyName << " width " << width << ": " << t.text.toStdString();
        }
    }
}

// ---- clevis-cli bar-diagram ----------------------------------------------

TEST_F(CliScratch, ExportsValidSvgPdfAndPngAtTheAskedAngle)
{
    const std::string base = "bar-diagram '" + kSixBar + "' --body rocker --at-deg 90.5 --out ";
    const auto svg = scratch / "rocker.svg", pdf = scratch / "rocker.pdf", png = scratch / "rocker.png";
    for (const auto& file : {svg, pdf, png}) {
        const CliRun r = run(base + quoted(file));
        ASSERT_EQ(r.exitCode, 0) << r.err;
        ASSERT_TRUE(std::filesystem::exists(file)) << file;
    }
    const std::string svgText = readFile(svg);
    QXmlStreamReader xml(QByteArray::fromStdString(svgText));
    while (!xml.atEnd()) xml.readNext();
    EXPECT_FALSE(xml.hasError()) << xml.errorString().toStdString();
    EXPECT_TRUE(contains(svgText, "<svg"));
    EXPECT_TRUE(contains(svgText, "index_motor = 90.50°")) << "the exact position in the caption";
    for (const char* title : {"Axial force N (N)", "Shear force V (N)", "Bending moment M (N·m)"})
        EXPECT_TRUE(contains(svgText, title)) << title;
    const std::string pdfText = readFile(pdf);
    EXPECT_EQ(pdfText.rfind("%PDF-", 0), 0u);
    EXPECT_TRUE(contains(pdfText.substr(pdfText.size() - 16), "%%EOF"));
    const QImage image(QString::fromStdString(png.string()));
    ASSERT_FALSE(image.isNull());
    EXPECT_EQ(image.width(), 2 * 560);  // two pixels a point
    EXPECT_GT(image.height(), image.width());
}

TEST_F(CliScratch, RefusesWhatIsNotABarAndBadCommandLines)
{
    const auto out = quoted(scratch / "x.svg");
    CliRun r = run("bar-diagram '" + kSixBar + "' --body coupler_plate --at-deg 90 --out " + out);
    EXPECT_EQ(r.exitCode, 1);
    EXPECT_TRUE(contains(r.err, "body \"coupler_plate\" is not a bar: a plate with 3 joints")) << r.err;
    EXPECT_FALSE(std::filesystem::exists(scratch / "x.svg"));
    r = run("bar-diagram '" + kSixBar + "' --body nosuch --at-deg 90 --out " + out);
    EXPECT_EQ(r.exitCode, 1);
    EXPECT_TRUE(contains(r.err, "no body \"nosuch\" (bars: crank, rocker, dwell_link, finger_lever)")) << r.err;
    r = run("bar-diagram '" + kSixBar + "' --body ground --at-deg 90 --out " + out);
    EXPECT_EQ(r.exitCode, 1);
    EXPECT_TRUE(contains(r.err, "ground is the frame, not a bar")) << r.err;
    r = run("bar-diagram '" + kSixBar + "' --body rocker --at-deg 90 --out " + quoted(scratch / "x.txt"));
    EXPECT_EQ(r.exitCode, 2);
    EXPECT_TRUE(contains(r.err, "use a .svg, .pdf or .png file")) << r.err;
    r = run("bar-diagram '" + kSixBar + "' --at-deg 90 --out " + out);
    EXPECT_EQ(r.exitCode, 2);
    EXPECT_TRUE(contains(r.err, "--body is missing")) << r.err;
    r = run("bar-diagram '" + kSixBar + "' --body rocker --at-deg 90 --at-t 0.1 --out " + out);
    EXPECT_EQ(r.exitCode, 2);
    EXPECT_TRUE(contains(r.err, "exactly one of --at-deg, --at-t, --at-peak")) << r.err;
    r = run("bar-diagram --help");
    EXPECT_EQ(r.exitCode, 0);
    EXPECT_TRUE(contains(r.out, "Usage: clevis-cli bar-diagram FILE --body NAME")) << r.out;
}

// ---- The desktop view -----------------------------------------------------

class BarLoadViewTest : public ::testing::Test {
protected:
    QTemporaryDir recovery;
    ui::MainWindow window{recovery.path()};

    void settle()
    {
        window.analysis()->waitForIdle();
        QCoreApplication::processEvents();
    }
    ui::BarLoadView* view() const { return window.findChild<ui::BarLoadView*>(); }
    void select(const char* body) { window.document()->setSelection({ui::Selection::Kind::Body, body, -1}); }
    QAction* action(const QString& text) const
    {
        for (QAction* a : window.findChildren<QAction*>())
            if (a->text() == text) return a;
        ADD_FAILURE() << "no action " << text.toStdString();
        return nullptr;
    }
};

// The rocker selected and the cycle scrubbed: the view draws the rocker at
// that step (the same figures a diagram made apart from the window has) and
// lists its sizing; a plate says why it is not a bar; New leaves nothing.
TEST_F(BarLoadViewTest, ShowsTheSelectedBarAndClearsOnNew)
{
    ASSERT_TRUE(recovery.isValid());
    QString error;
    ASSERT_TRUE(window.files()->open(QString::fromStdString(kSixBar), &error)) << error.toStdString();
    settle();
    ASSERT_NE(view(), nullptr);
    const auto* dock = qobject_cast<QDockWidget*>(view()->parentWidget());
    ASSERT_NE(dock, nullptr);
    EXPECT_EQ(dock->windowTitle(), "Loads along the link");
    EXPECT_EQ(view()->figure(), nullptr);
    EXPECT_TRUE(view()->message().startsWith("Select a link")) << view()->message().toStdString();

    select("rocker");
    window.analysis()->setCurrentStep(123);
    QCoreApplication::processEvents();
    ASSERT_NE(view()->figure(), nullptr) << view()->message().toStdString();
    const Solved s = solveSample("dwell_six_bar.json");
    const BarModel& rocker = s.bars.bars[barIndex(s, "rocker")];
    const auto apart = barAtStep(s.m, rocker, s.r.steps[123], barEnvelopeBand(s.m, s.r, rocker, 101));
    ASSERT_EQ(view()->figure()->atStep().values.size(), apart.values.size());
    for (std::size_t i = 0; i < apart.values.size(); ++i)
        EXPECT_NEAR(view()->figure()->atStep().values[i].moment, apart.values[i].moment, 1e-9);
    const auto texts = textsOf(*view()->figure());
    EXPECT_TRUE(std::any_of(texts.begin(), texts.end(),
                            [](const RecordedText& t) { return t.text == "Internal loads along rocker"; }));
    EXPECT_TRUE(std::any_of(texts.begin(), texts.end(),
                            [](const RecordedText& t) { return t.text.contains("(step 123 of 360)"); }));
    const QString sizing = view()->sizingText();
    EXPECT_TRUE(sizing.contains("At this position: fibre stress")) << sizing.toStdString();
    EXPECT_TRUE(sizing.contains("\"rocker\", L = ")) << sizing.toStdString();
    EXPECT_TRUE(sizing.contains("utilisation")) << sizing.toStdString();

    select("coupler_plate");
    EXPECT_EQ(view()->figure(), nullptr);
    EXPECT_TRUE(view()->message().startsWith("coupler_plate is not a bar: a plate with 3 joints"))
        << view()->message().toStdString();

    select("rocker");
    ASSERT_NE(view()->figure(), nullptr);
    action("&New")->trigger();
    QCoreApplication::processEvents();
    EXPECT_EQ(view()->figure(), nullptr);
    EXPECT_TRUE(view()->sizingText().isEmpty());
    EXPECT_FALSE(view()->message().contains("rocker")) << view()->message().toStdString();
    settle();
    EXPECT_EQ(view()->figure(), nullptr);
}

// A rename: the new name is drawn once the edit is solved, and the old never.
TEST_F(BarLoadViewTest, FollowsARename)
{
    QString error;
    ASSERT_TRUE(window.files()->open(QString::fromStdString(kSixBar), &error)) << error.toStdString();
    settle();
    select("rocker");
    ASSERT_NE(view()->figure(), nullptr);
    ASSERT_EQ(window.document()->apply("Rename", [](Mechanism& m) { ui::edits::renameBody(m, "rocker", "arm"); }),
              QString());
    select("arm");
    EXPECT_EQ(view()->figure(), nullptr) << "nothing drawn under the old name while the edit is solved";
    settle();
    ASSERT_NE(view()->figure(), nullptr) << view()->message().toStdString();
    const auto texts = textsOf(*view()->figure());
    EXPECT_TRUE(std::any_of(texts.begin(), texts.end(),
                            [](const RecordedText& t) { return t.text == "Internal loads along arm"; }));
}

}  // namespace
