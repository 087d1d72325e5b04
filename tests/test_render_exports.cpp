// Headless exports: a free-body diagram written by `clevis-cli fbd` carries
// the solver's numbers for that body and step, and the design-review report
// renders page by page with its sections and the summary's peak table; the
// plot panes are described from the results alone and the report draws them.
#include "app/cli_render_commands.h"
#include "core/file/mechanism_file.h"
#include "core/results/cycle_summary.h"
#include "core/results/cylinder_ends.h"
#include "core/results/free_body.h"
#include "core/solver/cycle_sweep.h"
#include "render/mechanism_sketch.h"
#include "render/page_flow.h"
#include "render/plot_panes.h"
#include "render/render_units.h"
#include "render/review_report.h"

#include <QDir>
#include <QFile>
#include <QFontMetricsF>
#include <QGuiApplication>
#include <QImage>
#include <QPainter>
#include <QProcess>
#include <QRegularExpression>
#include <QTemporaryDir>

#include <gtest/gtest.h>

#include <cmath>
#include <map>
#include <set>

using namespace clevis;

namespace {

const std::string kPress = std::string(CLEVIS_SAMPLES_DIR) + "/punch_press.json";

struct Solved {
    CompiledMechanism m;
    CycleResult r;
    CycleSummary s;
};

Solved solveFile(const std::string& path)
{
    Solved out{compile(loadMechanismFile(path).mechanism), {}, {}};
    out.r = sweepCycle(out.m);
    out.s = summarize(out.m, out.r);
    return out;
}

// The SVG's text runs grouped into lines by their baseline, left to right.
using SvgLines = std::map<double, std::vector<std::pair<double, QString>>>;

SvgLines svgLines(const QString& path)
{
    QFile f(path);
    EXPECT_TRUE(f.open(QIODevice::ReadOnly)) << path.toStdString();
    const QString svg = QString::fromUtf8(f.readAll());
    static const QRegularExpression run(R"re(<text[^>]*\bx="([-\d.e]+)" y="([-\d.e]+)"[^>]*>([^<]*)</text>)re");
    SvgLines lines;
    for (auto it = run.globalMatch(svg); it.hasNext();) {
        const auto m = it.next();
        QString text = m.captured(3).trimmed();
        text.replace("&amp;", "&").replace("&lt;", "<").replace("&gt;", ">");
        lines[m.captured(2).toDouble()].emplace_back(m.captured(1).toDouble(), text);
    }
    for (auto& [y, runs] : lines) std::sort(runs.begin(), runs.end());
    return lines;
}

// The number a cell or run starts with, after an optional "name = " prefix.
double leadingNumber(const QString& text)
{
    static const QRegularExpression number(R"((-?\d+(\.\d+)?))");
    const auto m = number.match(text.section("= ", -1));
    EXPECT_TRUE(m.hasMatch()) << text.toStdString();
    return m.captured(1).toDouble();
}

// The table row whose first cell is `name`, cell by column heading (a cell
// belongs to the heading that starts at its x; empty cells have no run).
std::map<QString, QString> tableRow(const SvgLines& lines, const std::string& name)
{
    std::vector<std::pair<double, QString>> headings;
    for (const auto& [y, runs] : lines)
        if (!runs.empty() && runs.front().second == "Load") headings = runs;
    EXPECT_FALSE(headings.empty()) << "no table heading";
    for (const auto& [y, runs] : lines) {
        if (runs.empty() || runs.front().second != QString::fromStdString(name)) continue;
        std::map<QString, QString> cells;
        for (const auto& [x, text] : runs)
            for (auto h = headings.rbegin(); h != headings.rend(); ++h)
                if (h->first <= x + 0.5) {
                    cells[h->second] = text;
                    break;
                }
        return cells;
    }
    ADD_FAILURE() << "no table row " << name;
    return {};
}

// A run that starts with `prefix` (e.g. "Fx = " of "ΣFx = 12 N").
double runValue(const SvgLines& lines, const QString& prefix)
{
    for (const auto& [y, runs] : lines)
        for (const auto& r : runs)
            if (r.second.startsWith(prefix)) return leadingNumber(r.second);
    ADD_FAILURE() << "no run " << prefix.toStdString();
    return NAN;
}

void expectShown(double shown, double exact)
{
    // Four significant figures (or the unit's integer digits) are printed.
    EXPECT_NEAR(shown, exact, 6e-4 * std::abs(exact) + 1e-4) << "exact " << exact;
}

// `clevis-cli COMMAND ARGS...` as clevis-draw runs it.
int run(const std::string& command, std::vector<std::string> args)
{
    args.insert(args.begin(), command);
    return cli::runDrawCommand(args);
}

TEST(FreeBodySvg, NumbersEqualTheSolversForEveryBody)
{
    const Solved solved = solveFile(kPress);
    QTemporaryDir dir;
    for (const auto& body : solved.m.bodies) {
        const QString out = dir.filePath(QString::fromStdString(body.name) + ".svg");
        ASSERT_EQ(run("fbd", {kPress, "--body", body.name, "--at-deg", "160", "--out", out.toStdString()}), 0);
        // 160° of a one-revolution cycle in 360 steps from 0°: step 160.
        const FreeBodyDiagram d = freeBodyDiagram(solved.m, solved.r, findBody(solved.m, body.name), 160);
        const SvgLines lines = svgLines(out);
        ASSERT_FALSE(d.items.empty());
        for (const FreeBodyItem& item : d.items) {
            const auto cells = tableRow(lines, item.name);
            ASSERT_EQ(cells.count("Fx"), 1u) << item.name;
            expectShown(leadingNumber(cells.at("Fx")), item.force.x());
            expectShown(leadingNumber(cells.at("Fy")), item.force.y());
            expectShown(leadingNumber(cells.at("|F|")), item.force.norm());
            expectShown(leadingNumber(cells.at("Couple")), item.couple);
            EXPECT_EQ(cells.at("Kind"), freeBodyItemKindName(item.kind));
        }
        expectShown(runValue(lines, "Fx = "), d.fx.sum);
        expectShown(runValue(lines, "Fy = "), d.fy.sum);
        expectShown(runValue(lines, "M_G = "), d.moment.sum);
        expectShown(runValue(lines, "m·aGx = "), d.fx.kinetic);
        expectShown(runValue(lines, "m·aGy = "), d.fy.kinetic);
    }
}

TEST(FreeBodySvg, SharedPinArrowsAreEqualAndOpposite)
{
    QTemporaryDir dir;
    const QString crank = dir.filePath("crank.svg"), rod = dir.filePath("rod.svg");
    ASSERT_EQ(run("fbd", {kPress, "--body", "crankshaft", "--at-peak", "crank_pin", "--out", crank.toStdString()}), 0);
    ASSERT_EQ(run("fbd", {kPress, "--body", "connecting_rod", "--at-peak", "crank_pin", "--out", rod.toStdString()}),
              0);
    const auto onCrank = tableRow(svgLines(crank), "crank_pin"), onRod = tableRow(svgLines(rod), "crank_pin");
    ASSERT_TRUE(onCrank.count("Fy") && onRod.count("Fy"));
    EXPECT_GT(std::abs(leadingNumber(onRod.at("Fy"))), 1000.0);  // the press stroke loads this pin
    EXPECT_DOUBLE_EQ(leadingNumber(onCrank.at("Fx")), -leadingNumber(onRod.at("Fx")));
    EXPECT_DOUBLE_EQ(leadingNumber(onCrank.at("Fy")), -leadingNumber(onRod.at("Fy")));
    EXPECT_EQ(onCrank.at("|F|"), onRod.at("|F|"));  // the same magnitude
    EXPECT_EQ(onCrank.at("From"), "connecting_rod");
    EXPECT_EQ(onRod.at("From"), "crankshaft");
}

TEST(FreeBodySvg, PdfAndPngAreWritten)
{
    QTemporaryDir dir;
    for (const char* suffix : {"pdf", "png"}) {
        const QString out = dir.filePath(QString("ram.") + suffix);
        ASSERT_EQ(run("fbd", {kPress, "--body", "ram", "--at-t", "0.5", "--out", out.toStdString()}), 0);
        EXPECT_GT(QFile(out).size(), 2000) << suffix;
    }
}

TEST(FbdCommand, NamesTheOffendingItem)
{
    testing::internal::CaptureStderr();
    EXPECT_EQ(run("fbd", {kPress, "--body", "flywheel", "--at-deg", "10", "--out", "/tmp/x.svg"}), 2);
    EXPECT_NE(testing::internal::GetCapturedStderr().find("flywheel"), std::string::npos);
    testing::internal::CaptureStderr();
    EXPECT_EQ(run("fbd", {kPress, "--body", "ram", "--at-peak", "knee", "--out", "/tmp/x.svg"}), 2);
    EXPECT_NE(testing::internal::GetCapturedStderr().find("knee"), std::string::npos);
    testing::internal::CaptureStderr();
    EXPECT_EQ(run("fbd", {kPress, "--body", "ram", "--out", "/tmp/x.svg"}), 2);
    testing::internal::GetCapturedStderr();
    testing::internal::CaptureStderr();
    EXPECT_EQ(run("fbd", {"/nonexistent/press.json", "--body", "ram", "--at-t", "0", "--out", "/tmp/x.svg"}), 1);
    EXPECT_NE(testing::internal::GetCapturedStderr().find("press.json"), std::string::npos);
}

QString tool(const QString& program, const QStringList& args)
{
    QProcess p;
    p.start(program, args);
    EXPECT_TRUE(p.waitForFinished(60000)) << program.toStdString();
    EXPECT_EQ(p.exitCode(), 0) << program.toStdString() << ": " << p.readAllStandardError().toStdString();
    return QString::fromUtf8(p.readAllStandardOutput());
}

// --at-peak takes a cylinder's end pin as it takes a joint, so that the
// report's diagram at that peak can be drawn alone.
TEST(FbdCommand, DrawsABodyWhereACylinderEndPeaks)
{
    const std::string bedFile = std::string(CLEVIS_SAMPLES_DIR) + "/tipping_bed.json";
    const Solved bed = solveFile(bedFile);
    QTemporaryDir dir;
    const QString svg = dir.filePath("bed.svg");
    ASSERT_EQ(run("fbd", {bedFile, "--body", "bed", "--at-peak", "lift_cylinder.rod", "--out", svg.toStdString()}), 0);
    QFile f(svg);
    ASSERT_TRUE(f.open(QIODevice::ReadOnly));
    const QString text = QString::fromUtf8(f.readAll());
    const std::string peak = ui::RenderUnits().force(bed.s.cylinderEnds[1].peak.value).toStdString();
    EXPECT_TRUE(text.contains(QString::fromStdString(peak))) << peak;

    testing::internal::CaptureStderr();
    EXPECT_EQ(run("fbd", {bedFile, "--body", "bed", "--at-peak", "lift_cylinder", "--out", svg.toStdString()}), 2);
    const std::string err = testing::internal::GetCapturedStderr();
    EXPECT_NE(err.find("lift_cylinder.rod"), std::string::npos) << err;  // the names it takes are listed
}

TEST(ReviewReport, RendersEveryPageWithItsSectionsAndThePeakTable)
{
    const Solved solved = solveFile(kPress);
    QTemporaryDir dir;
    const QString pdf = dir.filePath("review.pdf");
    ASSERT_EQ(run("report", {kPress, "--out", pdf.toStdString()}), 0);

    const QString info = tool("pdfinfo", {pdf});
    const int pages = QRegularExpression(R"(Pages:\s+(\d+))").match(info).captured(1).toInt();
    ASSERT_GE(pages, 5);
    tool("pdftoppm", {"-r", "40", "-png", pdf, dir.filePath("page")});
    EXPECT_EQ(QDir(dir.path()).entryList({"page-*.png"}).size(), pages);

    const QString text = tool("pdftotext", {"-layout", pdf, "-"});
    for (const QString& section : ui::reviewReportSections(true))  // the press has a gearbox
        EXPECT_TRUE(text.contains(section)) << section.toStdString();
    for (const char* caution :
         {"ideal joints", "the allowables you gave, not a verdict", "wear life of bearings are not covered",
          "service and dynamic factors", "local codes", "licensed engineer"})
        EXPECT_TRUE(text.contains(caution)) << caution;
    // Where each mass came from, as the sample file gives it.
    for (const char* source : {"typed in", "steel bar 50 × 30 mm", "typed in + 1 point mass"})
        EXPECT_TRUE(text.contains(source)) << source;

    // The peak table, row by row, has summarize()'s numbers.
    const ui::RenderUnits u;
    const QStringList lines = text.split('\n');
    const auto rowOf = [&](const std::string& name) {
        for (const QString& l : lines)
            if (l.trimmed().startsWith(QString::fromStdString(name) + " ") && l.contains("(step ")) return l;
        return QString();
    };
    for (const auto& j : solved.s.joints) {
        const QString row = rowOf(j.name);
        EXPECT_TRUE(row.contains(u.force(j.peak.value))) << j.name << ": " << row.toStdString();
        EXPECT_TRUE(row.contains(u.force(j.rms))) << j.name << ": " << row.toStdString();
        EXPECT_TRUE(row.contains(QString("(step %1)").arg(j.peak.step))) << j.name;
    }
    for (const auto& d : solved.s.drivers) {
        const QString row = rowOf(d.name);
        EXPECT_TRUE(row.contains(u.torque(d.peak.value))) << d.name << ": " << row.toStdString();
        EXPECT_TRUE(row.contains(u.torque(d.rms))) << d.name;
        EXPECT_TRUE(row.contains(u.torque(d.mean))) << d.name;
        EXPECT_TRUE(row.contains(ui::formatQuantity(d.work, "J"))) << d.name;
    }
}

// The report cuts a body free where a pin carries its peak: a cylinder's end
// pins count as the joints do, and the most heavily loaded come first.
TEST(ReviewReport, CutsBodiesFreeAtTheCylinderEndsPeaksToo)
{
    const Solved bed = solveFile(std::string(CLEVIS_SAMPLES_DIR) + "/tipping_bed.json");
    const auto ends = cylinderEnds(bed.m);
    ASSERT_EQ(ends.size(), 2u);
    const CylinderEnd& rod = ends[1];  // the cap end is on ground: nothing to cut free there
    ASSERT_EQ(rod.side, CylinderSide::Rod);
    ASSERT_NE(rod.body, kGround);

    const auto critical = ui::criticalPositions(bed.m, bed.s);
    const auto atRod = std::find_if(critical.begin(), critical.end(), [&](const ui::CriticalPosition& c) {
        return c.reason == QString("peak at cylinder end %1").arg(QString::fromStdString(rod.name));
    });
    ASSERT_NE(atRod, critical.end());
    EXPECT_EQ(atRod->body, rod.body);
    EXPECT_EQ(atRod->step, bed.s.cylinderEnds[1].peak.step);

    // On the six-bar, the joints' diagrams come heaviest first.
    const Solved six = solveFile(std::string(CLEVIS_SAMPLES_DIR) + "/dwell_six_bar.json");
    const auto drawn = ui::criticalPositions(six.m, six.s);
    std::vector<double> loads;
    for (const auto& c : drawn)
        for (const auto& j : six.s.joints)
            if (c.reason == QString("peak at joint %1").arg(QString::fromStdString(j.name)))
                loads.push_back(j.peak.value);
    ASSERT_EQ(loads.size(), drawn.size());
    ASSERT_GE(loads.size(), 3u);
    EXPECT_TRUE(std::is_sorted(loads.rbegin(), loads.rend()));
}

// Fonts need an application object; it is kept for the rest of the run, as
// the drawing commands keep theirs.
void ensureFonts()
{
    if (QCoreApplication::instance()) return;
    static int argc = 1;
    static char name[] = "clevis_render_tests";
    static char* argv[] = {name, nullptr};
    static QGuiApplication app(argc, argv);
}

// A report table's column widens to hold its longest text, taking the room
// from columns that spare it; where nothing can be spared, every width stays
// finite and the total stays the page's.
TEST(ReportTable, ColumnsWidenToTheirTextFromColumnsWithRoomToSpare)
{
    ensureFonts();
    const std::vector<QStringList> drivers{
        {"Driver", "Peak", "Where", "RMS", "Mean", "Peak power", "Regenerative", "Work"},
        {"lift_cylinder", "32525 N", "0.8000 s (step 16)", "21322 N", "19972 N", "4582 W", "–", "23766 J"}};
    const std::vector<double> shares{0.11, 0.12, 0.2, 0.11, 0.11, 0.12, 0.12, 0.11};
    const double page = 515;
    const QFontMetricsF head(ui::reportFont(ui::kTableFont, true)), body(ui::reportFont(ui::kTableFont));
    const auto need = [&](int c) {
        return std::max(head.horizontalAdvance(drivers[0][c]), body.horizontalAdvance(drivers[1][c])) + ui::kCellGap;
    };
    ASSERT_GT(need(6), shares[6] * page);  // "Regenerative" does not fit its share

    const std::vector<double> widths = ui::tableColumnWidths(drivers, shares, page);
    ASSERT_EQ(widths.size(), shares.size());
    double total = 0;
    for (int c = 0; c < int(widths.size()); ++c) {
        EXPECT_GE(widths[c], need(c) - 1e-9) << drivers[0][c].toStdString();
        total += widths[c];
    }
    EXPECT_NEAR(total, page, 1e-9);

    // Far too narrow a page: the texts are shortened, the columns still fill it.
    const std::vector<double> cramped = ui::tableColumnWidths(drivers, shares, 120);
    total = 0;
    for (const double w : cramped) {
        EXPECT_TRUE(std::isfinite(w) && w > 0);
        total += w;
    }
    EXPECT_NEAR(total, 120, 1e-9);
}

// The report's sketch shows a motor turning the way it turns: the same step
// with the rate's sign changed draws a different arrow, and only the arrow.
TEST(MechanismSketch, TheMotorsArrowTurnsWithTheMotor)
{
    ensureFonts();
    const Solved flap = solveFile(std::string(CLEVIS_SAMPLES_DIR) + "/flap_folder.json");
    StepResult turned = flap.r.steps.front();
    turned.driveRate[0] = -turned.driveRate[0];
    const auto picture = [&](const StepResult& step) {
        QImage image(515, 330, QImage::Format_RGB32);
        image.fill(Qt::white);
        QPainter p(&image);
        ui::MechanismSketch(flap.m, step, "").paint(p, image.rect());
        return image;
    };
    const QImage forwards = picture(flap.r.steps.front()), backwards = picture(turned);
    ASSERT_EQ(forwards.size(), backwards.size());
    // Every pixel that differs lies within the arrow's reach of the driven pin.
    QRect changed;
    for (int y = 0; y < forwards.height(); ++y)
        for (int x = 0; x < forwards.width(); ++x)
            if (forwards.pixel(x, y) != backwards.pixel(x, y)) changed |= QRect(x, y, 1, 1);
    ASSERT_FALSE(changed.isEmpty());
    EXPECT_LE(changed.width(), 40);
    EXPECT_LE(changed.height(), 40);
}

std::vector<QString> paneTitles(const std::vector<ui::PlotPane>& panes)
{
    std::vector<QString> titles;
    for (const auto& p : panes) titles.push_back(p.title);
    return titles;
}

TEST(PlotPanes, AreDescribedFromTheResultsAlone)
{
    const Solved solved = solveFile(kPress);
    const auto panes = ui::plotPanes(solved.m, solved.r, ui::RenderUnits{});
    EXPECT_EQ(
        paneTitles(panes),
        (std::vector<QString>{"Joint reactions |F|", "Drive torque", "Driver power (positive: into the mechanism)",
                              "Shaking force on the frame", "Shaking moment on the frame", "Transmission angle"}));
    std::vector<QString> units;
    for (const auto& p : panes) units.push_back(p.unit);
    EXPECT_EQ(units, (std::vector<QString>{"N", "N·m", "W", "N", "N·m", "°"}));
    std::vector<QString> reactions;
    for (const auto& c : panes[0].curves) reactions.push_back(c.series.name);
    EXPECT_EQ(reactions, (std::vector<QString>{"main_bearing |F|", "crank_pin |F|", "wrist_pin |F|", "ram_guide |F|"}));
    EXPECT_EQ(panes[1].curves.at(0).series.name, "main_motor torque");
    EXPECT_EQ(panes[2].curves.at(0).series.name, "main_motor power");
    for (const auto& p : panes)
        for (const auto& c : p.curves)
            EXPECT_EQ(c.series.values.size(), solved.r.steps.size()) << c.series.name.toStdString();
    EXPECT_DOUBLE_EQ(panes[0].curves[1].series.values[100], solved.r.steps[100].joints[1].force.norm());
}

TEST(PlotPanes, FollowTheChoiceOfJointsAndComponents)
{
    const Solved solved = solveFile(kPress);
    const auto panes = ui::plotPanes(solved.m, solved.r, ui::RenderUnits{}, {{"main_bearing", "ram_guide"}, true});
    ASSERT_FALSE(panes.empty());
    EXPECT_EQ(panes[0].title, "Joint reactions |F|, Fx, Fy");
    std::vector<QString> names;
    std::set<int> pens;
    for (const auto& c : panes[0].curves) {
        names.push_back(c.series.name);
        pens.insert(c.pen);
    }
    EXPECT_EQ(names, (std::vector<QString>{"crank_pin |F|", "crank_pin Fx", "crank_pin Fy", "wrist_pin |F|",
                                           "wrist_pin Fx", "wrist_pin Fy"}));
    EXPECT_EQ(pens.size(), names.size()) << "every curve of a pane has a pen of its own";
    // No joint ticked: no reactions pane.
    const auto none = ui::plotPanes(solved.m, solved.r, ui::RenderUnits{},
                                    {{"main_bearing", "crank_pin", "wrist_pin", "ram_guide"}, false});
    EXPECT_EQ(none.front().title, "Drive torque");
}

// A cylinder's end pins are plotted as joints are, after them, and can be
// hidden by name like a joint: the rod end's |F| is the cylinder's effort
// (a two-force member), its components those of the end's reaction.
TEST(PlotPanes, ACylindersEndPinsArePlottedAfterTheJoints)
{
    const Solved solved = solveFile(std::string(CLEVIS_SAMPLES_DIR) + "/tipping_bed.json");
    const std::vector<CylinderEnd> ends = cylinderEnds(solved.m);
    ASSERT_EQ(ends.size(), 2u);
    const auto panes = ui::plotPanes(solved.m, solved.r, ui::RenderUnits{}, {{}, true});
    ASSERT_FALSE(panes.empty());
    const auto& curves = panes[0].curves;
    ASSERT_EQ(curves.size(), 3 * (solved.m.joints.size() + 2));
    const auto& rod = curves[curves.size() - 3];
    EXPECT_EQ(rod.series.name.toStdString(), ends[1].name + " |F|");
    const std::size_t k = solved.r.steps.size() / 2;
    const int d = ends[1].driver;
    EXPECT_NEAR(rod.series.values[k], std::abs(solved.r.steps[k].effort[std::size_t(d)]),
                1e-9 * std::abs(solved.r.steps[k].effort[std::size_t(d)]));
    EXPECT_EQ(curves.back().series.values[k], endReaction(solved.m, solved.r.steps[k], ends[1]).force.y());
    const auto hidden = ui::plotPanes(solved.m, solved.r, ui::RenderUnits{}, {{ends[0].name, ends[1].name}, false});
    EXPECT_EQ(hidden[0].curves.size(), solved.m.joints.size());
}

TEST(PlotPanes, TheReportDrawsEveryPaneUnderItsTitle)
{
    const Solved solved = solveFile(kPress);
    QTemporaryDir dir;
    const QString pdf = dir.filePath("review.pdf");
    ASSERT_EQ(run("report", {kPress, "--out", pdf.toStdString()}), 0);
    const QString text = tool("pdftotext", {pdf, "-"});
    qsizetype at = text.indexOf(ui::reviewReportSections()[2]);
    ASSERT_GE(at, 0);
    for (const QString& title : paneTitles(ui::plotPanes(solved.m, solved.r, ui::RenderUnits{}))) {
        at = text.indexOf(title, at);
        ASSERT_GE(at, 0) << title.toStdString() << " missing or out of order";
    }
}

}  // namespace
