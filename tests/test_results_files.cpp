// The JSON and CSV result files: their shape, units and the bearing-frame
// reactions, on a link whose pin load is known in closed form.
#include "core/results/cycle_summary.h"
#include "core/results/json_writer.h"
#include "core/results/results_csv.h"
#include "core/results/results_json.h"
#include "core/solver/compiled_mechanism.h"
#include "core/solver/cycle_sweep.h"
#include "tests/mechanism_builders.h"
#include "tests/solved_mechanism.h"

#include <gtest/gtest.h>

#include <cmath>
#include <limits>
#include <sstream>

using namespace clevis;
using nlohmann::json;
using test::solve;
using test::Solved;

namespace {

constexpr double kMass = 2.0, kArm = 0.3, kOmega = 4.0;  // kg, m, rad/s

// A link named with a comma (to exercise CSV quoting) spinning at constant
// speed without gravity on a ground pin at the origin, G on +x when drawn.
Mechanism spinningLink(int steps)
{
    Mechanism m;
    m.name = "spinner";
    m.gravity = Vec2::Zero();
    m.bodies = {test::pointBody("arm, left", kMass, Vec2(kArm, 0.0), 0.01)};
    m.joints = {test::pin("O", kGroundName, "arm, left", Vec2::Zero())};
    m.drivers = {test::rotary("motor", "O", ConstantSpeed{kOmega, 0.0})};
    m.cycle.steps = steps;
    return m;
}

// Splits one CSV line, honouring quoted fields.
std::vector<std::string> csvFields(const std::string& line)
{
    std::vector<std::string> fields(1);
    bool quoted = false;
    for (std::size_t i = 0; i < line.size(); ++i) {
        const char c = line[i];
        if (c == '"' && quoted && i + 1 < line.size() && line[i + 1] == '"') fields.back() += line[++i];
        else if (c == '"') quoted = !quoted;
        else if (c == ',' && !quoted) fields.emplace_back();
        else fields.back() += c;
    }
    return fields;
}

TEST(ResultsJson, HasTheDocumentedShape)
{
    const Solved x = solve(spinningLink(24));
    const json j = json::parse(resultsJsonText(x.m, x.r, x.s));
    for (const char* key : {"steps", "summary", "warnings", "complete", "duration_s", "planned_steps"})
        EXPECT_TRUE(j.contains(key)) << key;
    EXPECT_EQ(j["steps"].size(), 25u);
    EXPECT_EQ(j["planned_steps"], 24);
    EXPECT_TRUE(j["complete"].get<bool>());
    EXPECT_NEAR(j["duration_s"].get<double>(), 2 * kPi / kOmega, 1e-12);

    const json& step = j["steps"][6];
    EXPECT_NEAR(step["drive"]["motor"].get<double>(), 90.0, 1e-9);  // degrees, a quarter turn
    const json& body = step["bodies"]["arm, left"];
    for (const char* key : {"x", "y", "angle_deg", "vx", "vy", "omega", "ax", "ay", "alpha"})
        EXPECT_TRUE(body.contains(key)) << key;
    EXPECT_NEAR(body["angle_deg"].get<double>(), 90.0, 1e-9);
    EXPECT_NEAR(body["omega"].get<double>(), kOmega, 1e-12);
    for (const char* key : {"fx", "fy", "moment", "local"}) EXPECT_TRUE(step["joints"]["O"].contains(key)) << key;
    for (const char* key : {"effort", "power"}) EXPECT_TRUE(step["drivers"]["motor"].contains(key)) << key;
    for (const char* key : {"fx", "fy", "moment"}) EXPECT_TRUE(step["ground"].contains(key)) << key;
    for (const char* key : {"kinetic", "gravity", "spring"}) EXPECT_TRUE(step["energy"].contains(key)) << key;
    EXPECT_TRUE(step["transmission_deg"].is_object());
    EXPECT_FALSE(step["near_singular"].get<bool>());

    const json& summary = j["summary"];
    for (const char* key : {"peak_n", "peak_step", "peak_t", "peak_drive", "rms_n"})
        EXPECT_TRUE(summary["joints"]["O"].contains(key)) << key;
    EXPECT_FALSE(summary["joints"]["O"].contains("peak_moment_nm"));  // a pin
    EXPECT_EQ(summary["drivers"]["motor"]["unit"], "N·m");
    for (const char* key : {"peak", "rms", "mean", "peak_power_w", "peak_regen_w", "work_j"})
        EXPECT_TRUE(summary["drivers"]["motor"].contains(key)) << key;
    for (const char* key : {"peak_force_n", "peak_force_step", "peak_moment_nm", "peak_moment_step"})
        EXPECT_TRUE(summary["ground"].contains(key)) << key;
    for (const char* key : {"driver_work_j", "kinetic_change_j", "gravity_change_j", "spring_change_j", "damper_work_j",
                            "load_work_j", "residual_j", "throughput_j", "relative_residual"})
        EXPECT_TRUE(summary["energy_balance"].contains(key)) << key;
    EXPECT_EQ(summary["near_singular_steps"], 0);
    const double centripetal = kMass * kOmega * kOmega * kArm;  // m ω² d
    EXPECT_NEAR(summary["joints"]["O"]["peak_n"].get<double>(), centripetal, 1e-9 * centripetal);
}

// The pin pulls G towards O with m ω² d: in the link's own frame that is a
// constant (−m ω² d, 0) (G lies on the link's +x axis), while the ground,
// whose frame is global, feels +m ω² d along the turning line O→G.
TEST(ResultsJson, BearingReactionsAreInEachBodysFrame)
{
    const Solved x = solve(spinningLink(24));
    const json j = json::parse(resultsJsonText(x.m, x.r, x.s));
    const double f = kMass * kOmega * kOmega * kArm;
    for (const json& step : j["steps"]) {
        const double theta = kOmega * step["t"].get<double>();
        const json& local = step["joints"]["O"]["local"];
        EXPECT_NEAR(local["second"]["fx"].get<double>(), -f, 1e-9 * f);
        EXPECT_NEAR(local["second"]["fy"].get<double>(), 0.0, 1e-9 * f);
        EXPECT_NEAR(local["first"]["fx"].get<double>(), f * std::cos(theta), 1e-9 * f);
        EXPECT_NEAR(local["first"]["fy"].get<double>(), f * std::sin(theta), 1e-9 * f);
    }
}

// Against a brake the motor always delivers power (T₀ω > 0), so there is no
// regenerative peak and its step is null.
TEST(ResultsJson, AMissingStepIsNull)
{
    Mechanism mech = spinningLink(12);
    mech.loads = {TorqueLoad{"brake", "arm, left", -2.0, std::nullopt}};
    const Solved x = solve(mech);
    ASSERT_EQ(x.s.drivers[0].peakRegenerative.step, -1);
    const json j = json::parse(resultsJsonText(x.m, x.r, x.s));
    EXPECT_TRUE(j["summary"]["drivers"]["motor"]["peak_regen_step"].is_null());
    EXPECT_EQ(j["summary"]["drivers"]["motor"]["peak_regen_w"], 0.0);
    EXPECT_TRUE(j["summary"]["drivers"]["motor"]["peak_power_step"].is_number_integer());
}

TEST(ResultsCsv, HeaderCarriesUnitsAndEveryRowMatchesIt)
{
    const Solved x = solve(spinningLink(24));
    std::istringstream in(resultsCsvText(x.m, x.r));
    std::string line;
    std::getline(in, line);
    EXPECT_EQ(line.rfind("t [s],motor [deg],\"arm, left.x [m]\",", 0), 0u) << line;
    const std::vector<std::string> header = csvFields(line);
    for (const char* column : {"O.fx [N]", "O.moment [N·m]", "motor.effort [N·m]", "motor.power [W]", "ground.fx [N]",
                               "ground.moment [N·m]", "kinetic [J]", "near_singular"})
        EXPECT_NE(std::find(header.begin(), header.end(), column), header.end()) << column;
    int rows = 0;
    while (std::getline(in, line)) {
        EXPECT_EQ(csvFields(line).size(), header.size()) << line;
        ++rows;
    }
    EXPECT_EQ(rows, 25);
}

TEST(ResultsCsv, ValuesAreTheStepResultsInDisplayUnits)
{
    const Solved x = solve(spinningLink(8));
    std::istringstream in(resultsCsvText(x.m, x.r));
    std::string line;
    std::getline(in, line);
    const std::vector<std::string> header = csvFields(line);
    const auto column = [&](const std::string& name) {
        return std::size_t(std::find(header.begin(), header.end(), name) - header.begin());
    };
    for (const StepResult& s : x.r.steps) {
        std::getline(in, line);
        const std::vector<std::string> v = csvFields(line);
        // Shortest round-trip formatting: every number reads back bit for bit.
        EXPECT_EQ(std::stod(v[column("t [s]")]), s.t);
        EXPECT_EQ(std::stod(v[column("motor [deg]")]), radToDeg(s.drivePosition[0]));
        EXPECT_EQ(std::stod(v[column("arm, left.angle [deg]")]), radToDeg(s.q[2]));
        EXPECT_EQ(std::stod(v[column("arm, left.alpha [rad/s²]")]), s.qdd[2]);
        EXPECT_EQ(std::stod(v[column("O.fx [N]")]), s.joints[0].force.x());
        EXPECT_EQ(std::stod(v[column("O.fy [N]")]), s.joints[0].force.y());
        EXPECT_EQ(v[column("near_singular")], s.nearSingular ? "1" : "0");
    }
}

// Shortest round-trip formatting: every number of every step reads back bit
// for bit, on a link whose values are not round (gravity off the axes).
TEST(ResultsJson, EveryNumberReadsBackBitForBit)
{
    Mechanism mech = spinningLink(36);
    mech.gravity = Vec2(0.3, -9.80665);
    const Solved x = solve(mech);
    const json j = json::parse(resultsJsonText(x.m, x.r, x.s));
    ASSERT_EQ(j["steps"].size(), x.r.steps.size());
    for (std::size_t k = 0; k < x.r.steps.size(); ++k) {
        const StepResult& s = x.r.steps[k];
        const json& step = j["steps"][k];
        EXPECT_EQ(step["t"].get<double>(), s.t);
        const json& body = step["bodies"]["arm, left"];
        EXPECT_EQ(body["x"].get<double>(), s.q[0]);
        EXPECT_EQ(body["y"].get<double>(), s.q[1]);
        EXPECT_EQ(body["angle_deg"].get<double>(), radToDeg(s.q[2]));
        EXPECT_EQ(body["vx"].get<double>(), s.qd[0]);
        EXPECT_EQ(body["alpha"].get<double>(), s.qdd[2]);
        EXPECT_EQ(step["joints"]["O"]["fx"].get<double>(), s.joints[0].force.x());
        EXPECT_EQ(step["joints"]["O"]["fy"].get<double>(), s.joints[0].force.y());
        EXPECT_EQ(step["drivers"]["motor"]["effort"].get<double>(), s.effort[0]);
        EXPECT_EQ(step["ground"]["moment"].get<double>(), s.groundMoment);
        EXPECT_EQ(step["energy"]["gravity"].get<double>(), s.gravityPotential);
    }
}

// The streamed text is laid out as a document tree's two-space dump, so a
// small tree written through it reads the same; escapes and non-finite
// numbers follow RFC 8259 (NaN has no JSON form: null).
TEST(JsonWriter, WritesWhatATreeDumpWrites)
{
    const json tree = {{"a", {1, 2.5, -0.125, 1e-300}},
                       {"empty", json::object()},
                       {"none", json::array()},
                       {"nested", {{"name", "quote \" back\\ tab\t nl\n ctl\x01 µ"}, {"ok", true}, {"n", nullptr}}},
                       {"big", 123456789012LL}};
    std::string text;
    JsonWriter w(text);
    w.value(tree);
    EXPECT_EQ(json::parse(text), tree);
    EXPECT_EQ(text, tree.dump(2));

    std::string special;
    JsonWriter s(special);
    s.beginArray();
    s.value(std::nan(""));
    s.value(-std::numeric_limits<double>::infinity());
    s.value(0.1);
    s.endArray();
    EXPECT_EQ(special, "[\n  null,\n  null,\n  0.1\n]");

    // A compact container is one line, whatever it holds; its neighbours are not.
    std::string mixed;
    JsonWriter m(mixed);
    m.beginObject();
    m.key("steps").beginArray();
    m.beginObject(true);
    m.field("t", 0.5);
    m.key("xy").beginArray();
    m.value(1);
    m.value(2);
    m.endArray();
    m.endObject();
    m.beginObject(true);
    m.endObject();
    m.endArray();
    m.field("n", 3);
    m.endObject();
    EXPECT_EQ(mixed, "{\n  \"steps\": [\n    {\"t\":0.5,\"xy\":[1,2]},\n    {}\n  ],\n  \"n\": 3\n}");
}

// Keys escaped once (JsonKey, as each step's names are) write the same text
// as keys escaped at each use, first or not in their container, compact or
// indented, before numbers (non-finite ones too) and before containers.
TEST(JsonWriter, KeysEscapedOnceWriteWhatKeysEscapedEachTimeWrite)
{
    const std::string names[] = {"x", "angle_deg", "quote \" back\\ tab\t µ", "ctl\x01"};
    const double numbers[] = {0.1, -2.5e-300, std::nan(""), std::numeric_limits<double>::infinity(), 12.0};
    const auto write = [&](std::string& text, bool once) {
        JsonWriter w(text);
        w.beginObject();
        for (const bool compact : {false, true}) {
            w.key(compact ? "compact" : "indented").beginObject(compact);
            for (std::size_t i = 0; i < std::size(names); ++i) {
                const JsonKey key(names[i]);
                (once ? w.key(key) : w.key(names[i])).beginObject(i % 2 == 0);  // a key first in its container
                (once ? w.key(key) : w.key(names[i])).beginArray();
                w.endArray();
                w.endObject();
                for (const double v : numbers) {
                    if (once) w.field(key, v);
                    else w.field(names[i], v);
                }
                (once ? w.key(key) : w.key(names[i])).beginArray();
                w.value(true);
                w.endArray();
                if (once) w.field(key, "text");
                else w.field(names[i], "text");
            }
            w.endObject();
        }
        w.endObject();
    };
    std::string escapedOnce, escapedEachTime;
    write(escapedOnce, true);
    write(escapedEachTime, false);
    EXPECT_EQ(escapedOnce, escapedEachTime);
    // and both are the JSON a tree reads: the last of each repeated key
    const json j = json::parse(escapedOnce);
    EXPECT_EQ(j["compact"]["quote \" back\\ tab\t µ"], "text");
    EXPECT_EQ(escapedOnce.find("\n", escapedOnce.find("\"compact\"")), escapedOnce.rfind('\n'));  // one line
    EXPECT_NE(
        escapedOnce.find("{\"x\":{\"x\":[]},\"x\":0.1,\"x\":-2.5e-300,\"x\":null,\"x\":null,\"x\":12,\"x\":[true]"),
        std::string::npos)
        << escapedOnce;
}

// A link spinning long enough that its results run to several pieces.
Solved longRun() { return solve(spinningLink(15000)); }

// The pieces clevis-cli writes its files from, put together, are the whole
// text, byte for byte; every piece but the last is at least kTextPiece long.
TEST(ResultsFiles, PiecesMakeTheWholeText)
{
    const Solved x = longRun();
    for (const bool isJson : {true, false}) {
        std::vector<std::string> pieces;
        const TextPieces keep = [&](std::string_view piece) { pieces.emplace_back(piece); };
        if (isJson) writeResultsJson(keep, x.m, x.r, x.s);
        else writeResultsCsv(keep, x.m, x.r);
        const std::string whole = isJson ? resultsJsonText(x.m, x.r, x.s) : resultsCsvText(x.m, x.r);
        ASSERT_GE(pieces.size(), 3u) << "the test needs a file of several pieces";
        std::string joined;
        for (std::size_t i = 0; i < pieces.size(); ++i) {
            if (i + 1 < pieces.size()) EXPECT_GE(pieces[i].size(), kTextPiece) << i;
            joined += pieces[i];
        }
        EXPECT_EQ(joined.size(), whole.size()) << (isJson ? "json" : "csv");
        EXPECT_TRUE(joined == whole) << (isJson ? "json" : "csv");
    }
}

}  // namespace
