#include "core/results/results_csv.h"

#include "core/file/file_units.h"
#include "core/results/cylinder_ends.h"
#include "core/results/drive_units.h"

#include <charconv>
#include <string>
#include <vector>

namespace clevis {
namespace {

// RFC 4180 quoting: a field with a comma, quote or line break is enclosed in
// quotes, its quotes doubled.
std::string csvField(const std::string& text)
{
    if (text.find_first_of(",\"\r\n") == std::string::npos) return text;
    std::string quoted = "\"";
    for (const char c : text) {
        if (c == '"') quoted += '"';
        quoted += c;
    }
    return quoted + "\"";
}

// Headers spell degrees "deg", as the other angle columns do.
std::string driveHeaderUnit(DriverType type) { return type == DriverType::Rotary ? "deg" : "m"; }

std::vector<std::string> header(const CompiledMechanism& m, const CycleResult& r)
{
    std::vector<std::string> h{"t [s]"};
    for (const auto& d : m.drivers) h.push_back(d.name + " [" + driveHeaderUnit(d.type) + "]");
    static const char* const bodyColumns[] = {".x [m]",     ".y [m]",     ".angle [deg]",
                                              ".vx [m/s]",  ".vy [m/s]",  ".omega [rad/s]",
                                              ".ax [m/s²]", ".ay [m/s²]", ".alpha [rad/s²]"};
    for (const auto& b : m.bodies)
        for (const char* column : bodyColumns) h.push_back(b.name + column);
    for (const auto& j : m.joints)
        for (const char* column : {".fx [N]", ".fy [N]", ".moment [N·m]"}) h.push_back(j.name + column);
    for (const auto& d : m.drivers) {
        h.push_back(d.name + ".effort [" + effortUnit(d.type) + "]");
        h.push_back(d.name + ".power [W]");
    }
    for (const char* column :
         {"ground.fx [N]", "ground.fy [N]", "ground.moment [N·m]", "kinetic [J]", "gravity [J]", "spring [J]"})
        h.push_back(column);
    for (const auto& pin : r.transmissionPins) h.push_back(m.joints[pin.joint].name + ".transmission [deg]");
    h.push_back("near_singular");
    return h;
}

std::vector<std::string> driveHeader(const CompiledMechanism& m, const DriveResults& drive)
{
    std::vector<std::string> h;
    if (drive.found) h.push_back(m.drivers[std::size_t(drive.found->driver)].name + ".speed [rpm]");
    for (const MotorDuty& motor : drive.motors) {
        h.push_back(m.drivers[std::size_t(motor.driver)].name + ".motor_speed [rpm]");
        h.push_back(m.drivers[std::size_t(motor.driver)].name + ".motor_torque [N·m]");
    }
    return h;
}

void driveValues(std::vector<double>& v, const DriveResults& drive, const StepResult& s, std::size_t step)
{
    v.clear();
    if (drive.found) v.push_back(fromSi(FileUnit::Rpm, s.driveRate[std::size_t(drive.found->driver)]));
    for (const MotorDuty& motor : drive.motors)
        v.insert(v.end(), {fromSi(FileUnit::Rpm, motor.speed[step]), motor.torque[step]});
}

// Each cylinder end's reaction, as a joint's columns; after the drive's, so
// that columns read by position before them stay where they were.
std::vector<std::string> endHeader(const std::vector<CylinderEnd>& ends)
{
    std::vector<std::string> h;
    for (const CylinderEnd& end : ends)
        for (const char* column : {".fx [N]", ".fy [N]", ".moment [N·m]"}) h.push_back(end.name + column);
    return h;
}

void endValues(std::vector<double>& v, const CompiledMechanism& m, const std::vector<CylinderEnd>& ends,
               const StepResult& s)
{
    for (const CylinderEnd& end : ends) {
        const Reaction r = endReaction(m, s, end);
        v.insert(v.end(), {r.force.x(), r.force.y(), r.moment});
    }
}

// Shortest form that reads back to the same double, with the comma after it
// if asked (one append for both).
void appendNumber(std::string& out, double v, bool comma)
{
    char text[32];
    char* end = std::to_chars(text, text + sizeof text - 1, v).ptr;
    if (comma) *end++ = ',';
    out.append(text, end);
}

void rowValues(std::vector<double>& v, const CompiledMechanism& m, const StepResult& s)
{
    v.assign(1, s.t);
    for (std::size_t d = 0; d < m.drivers.size(); ++d)
        v.push_back(driveDisplayValue(m.drivers[d].type, s.drivePosition[d]));
    for (Eigen::Index i = 0; i < s.q.size(); i += 3) {
        v.insert(v.end(), {s.q[i], s.q[i + 1], radToDeg(s.q[i + 2])});
        v.insert(v.end(), {s.qd[i], s.qd[i + 1], s.qd[i + 2]});
        v.insert(v.end(), {s.qdd[i], s.qdd[i + 1], s.qdd[i + 2]});
    }
    for (const auto& j : s.joints) v.insert(v.end(), {j.force.x(), j.force.y(), j.moment});
    for (std::size_t d = 0; d < s.effort.size(); ++d) v.insert(v.end(), {s.effort[d], s.power[d]});
    v.insert(v.end(),
             {s.groundForce.x(), s.groundForce.y(), s.groundMoment, s.kinetic, s.gravityPotential, s.springPotential});
    v.insert(v.end(), s.transmissionDeg.begin(), s.transmissionDeg.end());
}

// The whole table into `text`; with `write`, handed on in pieces as it grows.
void streamResultsCsv(std::string& text, const TextPieces* write, const CompiledMechanism& m, const CycleResult& r,
                      const DriveResults* drive)
{
    std::vector<std::string> h = header(m, r);
    if (drive)
        for (auto& column : driveHeader(m, *drive)) h.push_back(std::move(column));
    const std::vector<CylinderEnd> ends = cylinderEnds(m);
    for (auto& column : endHeader(ends)) h.push_back(std::move(column));
    for (std::size_t i = 0; i < h.size(); ++i) {
        if (i) text += ',';
        text += csvField(h[i]);
    }
    text += '\n';
    std::vector<double> row, extra;
    for (const auto& s : r.steps) {
        rowValues(row, m, s);
        for (const double v : row) appendNumber(text, v, true);
        text += s.nearSingular ? "1" : "0";
        extra.clear();
        if (drive) driveValues(extra, *drive, s, std::size_t(&s - r.steps.data()));
        endValues(extra, m, ends, s);
        for (const double v : extra) {
            text += ',';
            appendNumber(text, v, false);
        }
        text += '\n';
        if (write && text.size() >= kTextPiece) {
            (*write)(text);
            text.clear();
        }
    }
    if (write) (*write)(text);
}

}  // namespace

std::string resultsCsvText(const CompiledMechanism& m, const CycleResult& r, const DriveResults* drive)
{
    std::string text;
    // About 24 characters a number (a double's shortest form takes up to 24), in the columns that grow with the
    // machine.
    text.reserve(std::size_t(r.steps.size() + 1) * 24 *
                 (1 + m.drivers.size() + 9 * m.bodies.size() + 3 * m.joints.size()));
    streamResultsCsv(text, nullptr, m, r, drive);
    return text;
}

void writeResultsCsv(const TextPieces& write, const CompiledMechanism& m, const CycleResult& r,
                     const DriveResults* drive)
{
    std::string text;
    text.reserve(kTextPiece + (kTextPiece >> 2));
    streamResultsCsv(text, &write, m, r, drive);
}

}  // namespace clevis
