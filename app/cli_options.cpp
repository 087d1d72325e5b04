#include "app/cli_options.h"

#include "core/model/model_limits.h"

#include <cctype>
#include <charconv>
#include <cmath>
#include <optional>

namespace clevis::cli {
namespace {

// More ratios than anyone reads in a table; the study costs little per ratio.
constexpr int kMaxRatioStudyPoints = 10000;

const char* const kOverview = R"(clevis-cli: the forces in a planar linkage over its whole cycle, without the GUI.

Usage:
  clevis-cli analyze FILE [--steps N] [--json OUT] [--csv OUT] [--ratio-study FROM:TO:N]
  clevis-cli fbd FILE --body NAME (--at-deg A | --at-t T | --at-peak PIN) --out F.svg|F.pdf|F.png
                 [--steps N] [--dalembert]
  clevis-cli report FILE --out review.pdf [--steps N]
  clevis-cli bearing-polar FILE --joint NAME [--body NAME] --out F.svg|F.pdf|F.png
                 [--steps N]
  clevis-cli internal-loads FILE --body NAME (--at-deg A | --at-t T | --at-peak PIN)
                 [--stations N] [--steps N] [--json OUT] [--csv OUT]
  clevis-cli bar-diagram FILE --body NAME (--at-deg A | --at-t T | --at-peak PIN)
                 --out F.svg|F.pdf|F.png [--steps N]
  clevis-cli analyze --help
  clevis-cli COMMAND --help
  clevis-cli --help
  clevis-cli --version

Commands:
  analyze    solve the mechanism in FILE over its cycle and print a summary,
             what it asks of each motor (through its gearbox) and cylinder,
             and the sizing of every bar and pin
  fbd        draw one body's free-body diagram at one position (with numbers):
             --at-deg A  at the first rotary driver's angle A (degrees, modulo
                         360°), --at-t T at time T s, or
                         --at-peak PIN where that pin's load peaks (a joint,
                         or a cylinder's end DRIVER.cap or DRIVER.rod);
             --dalembert draws the inertia force and couple on the body
  bearing-polar
             draw the load one joint puts on one of its bodies over the whole
             cycle, in that body's own frame (x and y are the global x and y
             at the drawn pose, turning with the body; the frame's are global):
             the curve the force's tip traces, the drive position marked every
             30° (a round step for other drives), the peak, and whether the
             load reverses on the bearing; --body NAME chooses which of the
             joint's two bodies (default: its second, on which the reaction
             acts); exit 2 naming the joint or body when either is wrong
  report     write the design-review PDF: drawing, inputs, plots, peak loads,
             free-body diagrams at the critical positions, energy balance,
             cautions
  internal-loads
             axial force, shear force and bending moment along one bar at
             one position, and their envelope over the cycle
  bar-diagram
             draw the axial force, shear force and bending moment along one
             bar at one position over their range over the cycle
  (fbd, bar-diagram, bearing-polar and report draw with Qt: clevis-cli runs
  clevis-draw, installed beside it with the desktop app, to draw them.)

Run "clevis-cli analyze --help" for the options, units, sign conventions and
exit codes. Documentation: docs/file-format.md (mechanism files),
docs/results-format.md (the --json and --csv output), docs/method.md (the
solver and its sign conventions).
)";

const char* const kAnalyzeHelp = R"(Usage: clevis-cli analyze FILE [--steps N] [--json OUT] [--csv OUT]
                         [--ratio-study FROM:TO:N]

Solves the mechanism in FILE (a Clevis mechanism file, docs/file-format.md)
over its whole cycle and prints a summary: peak and RMS joint loads, driver
effort, power and work, the load on the frame, transmission angles and an
energy-balance check. A value from a position near a toggle is shown apart,
marked, with the part that locks named. Where the one driver has a motor
characteristic ("motor"), the cycle is solved at the speed the motor gives:
the equation of motion is integrated turn after turn to the steady cycle
(one turn, the steps evenly spaced in position), with the mean speed, the
highest and lowest and the speed fluctuation shown, and the flywheel sized
where the file gives a "fluctuation_target". Then the drive: for a rotary
driver with a gearbox, the motor's torque (peak, RMS, mean), speed, power,
the energy it takes back per cycle and the load inertia it sees; for a
linear driver with a cylinder, the pressure and flow and whether the supply
pressure suffices. Then, for every bar: the largest
axial force, shear force and bending moment, the fibre stresses, the
utilisation against the allowable the file gives, and the Euler loads. Then,
for every pin and pin-in-slot joint and each end of a cylinder (the pins
DRIVER.cap and DRIVER.rod, listed with the joints): the peak force, and for
one with pin data (its "pin" in the file) the mean pin shear stress, the
bearing pressure and p·v, with their utilisations against the allowables the
file gives.
Utilisation is a figure to compare, not a verdict that a part is safe: rigid
bodies and ideal joints; no service or dynamic factors, fatigue, stress
concentrations or pin bending. Check each part under the codes that apply
and have the design reviewed by a licensed engineer.

Options:
  --steps N    intervals over the cycle, N >= 1 (N+1 positions are solved);
               default: the file's "cycle.steps", else 360
  --json OUT   write every step and the summary as JSON to the file OUT
  --csv OUT    write one row per step as CSV to the file OUT
  --ratio-study FROM:TO:N
               for every rotary driver with a gearbox, the RMS and peak motor
               torque at N gear ratios from FROM to TO (0 < FROM < TO,
               2 <= N <= 10000), spaced evenly on a logarithmic scale, with
               the gearbox's own efficiency and inertias; the ratio needing
               the least RMS torque is marked. The motion at the output is
               the same at every ratio: the cycle is solved once.
  -h, --help   show this help
  (--steps=N, --json=OUT, --csv=OUT and --ratio-study=FROM:TO:N work too)

Units: SI (m, s, kg, N, N·m, W, J), except angles: degrees. Rotary driver
positions are in degrees, linear ones in metres. In the drive section, motor
and driver speeds are in rpm, flywheel inertias in kg·m², pressures in MPa
and flows in L/min.

Signs: a joint's reaction is the force its first-listed body exerts on its
second, in global axes; a driver's effort is the torque (N·m) or force (N) it
applies to its second body, positive along the driver's coordinate; the frame
load is the force the mechanism puts on ground and its moment about the
origin; angles are counter-clockwise from +x. Details: docs/method.md and
docs/results-format.md.

Exit status:
  0  the whole cycle was solved and no position is near singular
  1  FILE cannot be read or is not a valid mechanism (the message on stderr
     starts with FILE), an output cannot be written, or the results are not
     trustworthy: the cycle could not be completed or some positions are near
     singular (dead centre, toggle), or a driver's flywheel or fluctuation
     target has no motor characteristic to act with (the cycle is solved at
     its prescribed speed instead). In those last cases the summary is
     still printed and the outputs written; the warnings follow on stderr.
     A motor that cannot keep the mechanism turning (it stalls: the message
     names the driver and the position) exits 1 with nothing written, as
     does --ratio-study on a file with no rotary driver with a gearbox.
  2  wrong command line
)";

// The position options and the bar's sign convention read the same in every
// command that takes them.
const std::string kPositionOptions = R"(  --at-deg A       where the first rotary driver is at A degrees (modulo
                   360°), solved at exactly that angle (the first time in the
                   cycle it is reached)
  --at-t T         at time T s, solved at exactly that time
  --at-peak PIN    at the solved position where that pin's load peaks: a
                   joint, or a cylinder's end (DRIVER.cap, DRIVER.rod)
)";

const std::string kBarSigns = R"(
Signs (docs/method.md, "Internal loads along a bar"): N > 0 is tension. Look
along the bar from its first end to its second with its left side up: V and M
then have the beam-table signs (V > 0 at a left-hand support, M > 0 sagging).
)";

const std::string kInternalLoadsHelp =
    R"(Usage: clevis-cli internal-loads FILE --body NAME (--at-deg A | --at-t T | --at-peak PIN)
                 [--stations N] [--steps N] [--json OUT] [--csv OUT]

Prints the internal loads of the bar NAME at one position: the axial force N,
shear force V and bending moment M at N equally spaced stations from its
first end (s = 0) to its second, and their envelope over the whole cycle
(largest tension and compression, |V| and |M|, with the station and drive
position of each). A bar is a body with a section, or a body with exactly two
joints; the output says how its mass is laid along it.

Options:
  --body NAME      the bar
)" + kPositionOptions +
    R"(  --stations N     stations along the bar, N >= 2, both ends included
                   (default 21); the envelope uses the same stations
  --steps N        intervals over the cycle (default: the file's setting)
  --json OUT       write the stations and the envelope as JSON to OUT
  --csv OUT        write the stations as CSV to OUT (s_m, axial_N, shear_N,
                   moment_Nm)
  (--name=value works too)
)" + kBarSigns +
    R"(
Exit status:
  0  done, and the cycle is trustworthy
  1  FILE cannot be read or analysed; NAME is not a body or not a bar; the
     joint is unknown; the position is not reached in the solved cycle; an
     output cannot be written; or the results are not trustworthy (the
     loads are still printed)
  2  wrong command line
)";

const std::string kBarDiagramHelp =
    R"(Usage: clevis-cli bar-diagram FILE --body NAME (--at-deg A | --at-t T | --at-peak PIN)
                 --out F.svg|F.pdf|F.png [--steps N]

Draws the internal loads of the bar NAME at one position: three diagrams
along it, the axial force N, shear force V and bending moment M against s
from its first end to its second (the joints named at the ends), each over a
shaded band: the largest and smallest value at each station over the whole
cycle. Under each diagram, the peaks at this position and over the cycle,
with their station and drive position. Lengths in mm, forces in N, moments
in N·m. A bar is a body with a section, or a body with exactly two joints.

Options:
  --body NAME      the bar
)" + kPositionOptions +
    R"(  --out F          the drawing, as SVG, PDF or PNG by its suffix
  --steps N        intervals over the cycle (default: the file's setting)
  (--name=value works too)
)" + kBarSigns +
    R"(
Exit status:
  0  done, and the cycle is trustworthy
  1  FILE cannot be read or analysed; NAME is not a body or not a bar (the
     message says why); the drawing cannot be written; the results are not
     trustworthy (the drawing is still written); or clevis-draw, which draws
     it, is missing
  2  wrong command line: an unknown option, a joint the file does not have,
     or a position the solved cycle does not reach
)";

const std::string kFbdHelp =
    R"(Usage: clevis-cli fbd FILE --body NAME (--at-deg A | --at-t T | --at-peak PIN)
                 --out F.svg|F.pdf|F.png [--steps N] [--dalembert]

Draws the free-body diagram of the body NAME at one position: every force and
couple on it as arrows, with a table of their components in N and N·m and
the sums ΣFx, ΣFy and ΣM_G beside m·aGx, m·aGy and I_G·α.

Options:
  --body NAME      the body
)" + kPositionOptions +
    R"(  --out F          the drawing, as SVG, PDF or PNG by its suffix
  --steps N        intervals over the cycle (default: the file's setting)
  --dalembert      also draw the inertia force and couple on the body
  (--name=value works too)

Exit status:
  0  done, and the cycle is trustworthy
  1  FILE cannot be read or analysed; the drawing cannot be written; the
     results are not trustworthy (the drawing is still written); or
     clevis-draw, which draws it, is missing
  2  wrong command line: an unknown option or body, a joint the file does not
     have, or a position the solved cycle does not reach
)";

const char* const kBearingPolarHelp =
    R"(Usage: clevis-cli bearing-polar FILE --joint NAME [--body NAME] --out F.svg|F.pdf|F.png
                 [--steps N]

Draws the load the joint NAME puts on one of its bodies over the whole cycle,
in that body's own frame (x and y are the global x and y at the drawn pose,
turning with the body; the frame's are global): the curve the force's tip
traces, the drive position marked every 30° (a round step for other drives),
the peak, and whether the load reverses on the bearing. Forces in N.

Options:
  --joint NAME     the joint, or a cylinder's end (DRIVER.cap at its first
                   point, DRIVER.rod at its second: drawn on the body there)
  --body NAME      which of its two bodies (default: its second, on which the
                   reaction acts)
  --out F          the drawing, as SVG, PDF or PNG by its suffix
  --steps N        intervals over the cycle (default: the file's setting)
  (--name=value works too)

Exit status:
  0  done, and the cycle is trustworthy
  1  FILE cannot be read or analysed; the drawing cannot be written; the
     results are not trustworthy (the drawing is still written); or
     clevis-draw, which draws it, is missing
  2  wrong command line, or a joint or body the file does not have (named)
)";

const char* const kReportHelp = R"(Usage: clevis-cli report FILE --out review.pdf [--steps N]

Writes the design-review PDF of the mechanism in FILE: drawing, inputs, plots,
peak loads, free-body diagrams at the critical positions, sizing of bars and
pins, energy balance, cautions. When stderr is a terminal and the report takes
over half a second, one line there tells how far it has got.

Options:
  --out F          the report, a .pdf file
  --steps N        intervals over the cycle (default: the file's setting)
  (--name=value works too)

Exit status:
  0  done, and the cycle is trustworthy
  1  FILE cannot be read or analysed; the report cannot be written; the
     results are not trustworthy (the report is still written); or
     clevis-draw, which writes it, is missing
  2  wrong command line
)";

bool isHelp(const std::string& arg) { return arg == "--help" || arg == "-h"; }

int parseSteps(const std::string& text)
{
    int value = 0;
    const auto [end, error] = std::from_chars(text.data(), text.data() + text.size(), value);
    if (error != std::errc() || end != text.data() + text.size() || value < 1 || value > kMaxSteps)
        throw UsageError("--steps needs a whole number from 1 to " + std::to_string(kMaxSteps) + ", not \"" + text +
                         "\"");
    return value;
}

class ArgumentReader {
public:
    explicit ArgumentReader(const std::vector<std::string>& args) : args_(args) {}
    bool done() const { return next_ >= args_.size(); }
    std::string take() { return args_[next_++]; }
    // The value given as "--name=value", or else the next argument.
    std::string valueOf(const std::string& option, const std::optional<std::string>& attached)
    {
        const std::string value = attached ? *attached : done() ? std::string() : take();
        if (value.empty()) throw UsageError(option + " needs a value");
        return value;
    }

private:
    const std::vector<std::string>& args_;
    std::size_t next_ = 0;
};

double parseNumber(const std::string& option, const std::string& text);

// FROM:TO:N with 0 < FROM < TO and N from 2 to kMaxRatioStudyPoints.
RatioStudyOption parseRatioStudy(const std::string& text)
{
    const std::size_t first = text.find(':'), second = first == std::string::npos ? first : text.find(':', first + 1);
    if (second == std::string::npos)
        throw UsageError("--ratio-study needs FROM:TO:N (e.g. 2:100:50), not \"" + text + "\"");
    RatioStudyOption o;
    o.from = parseNumber("--ratio-study FROM", text.substr(0, first));
    o.to = parseNumber("--ratio-study TO", text.substr(first + 1, second - first - 1));
    const std::string count = text.substr(second + 1);
    const auto [end, error] = std::from_chars(count.data(), count.data() + count.size(), o.count);
    if (error != std::errc() || end != count.data() + count.size() || o.count < 2 || o.count > kMaxRatioStudyPoints)
        throw UsageError("--ratio-study: N must be a whole number from 2 to " + std::to_string(kMaxRatioStudyPoints) +
                         ", not \"" + count + "\"");
    if (!(o.from > 0.0 && o.to > o.from))
        throw UsageError("--ratio-study: the ratios must satisfy 0 < FROM < TO (got " + text.substr(0, second) + ")");
    return o;
}

// One "--name[=value]" argument: its name and the value given after '='.
struct OptionWord {
    std::string name;
    std::optional<std::string> attached;
};

OptionWord optionWord(const std::string& arg)
{
    const std::size_t equals = arg.find('=');
    return {arg.substr(0, equals), equals == std::string::npos ? std::nullopt : std::optional(arg.substr(equals + 1))};
}

Command parseAnalyze(ArgumentReader& in)
{
    AnalyzeOptions options;
    while (!in.done()) {
        const std::string arg = in.take();
        if (isHelp(arg)) return HelpRequest{"analyze"};
        if (arg.size() > 1 && arg[0] == '-') {
            const auto [name, value] = optionWord(arg);
            if (name == "--steps") options.steps = parseSteps(in.valueOf(name, value));
            else if (name == "--json") options.jsonOut = in.valueOf(name, value);
            else if (name == "--csv") options.csvOut = in.valueOf(name, value);
            else if (name == "--ratio-study") options.ratioStudy = parseRatioStudy(in.valueOf(name, value));
            else throw UsageError("unknown option \"" + arg + "\" for analyze");
        } else if (options.file.empty()) options.file = arg;
        else throw UsageError("analyze takes one FILE; \"" + arg + "\" is a second one");
    }
    if (options.file.empty()) throw UsageError("analyze needs a mechanism FILE");
    return options;
}

int parseStations(const std::string& text)
{
    int value = 0;
    const auto [end, error] = std::from_chars(text.data(), text.data() + text.size(), value);
    if (error != std::errc() || end != text.data() + text.size() || value < 2 || value > kMaxSteps)
        throw UsageError("--stations needs a whole number from 2 (the two ends) to " + std::to_string(kMaxSteps) +
                         ", not \"" + text + "\"");
    return value;
}

double parseNumber(const std::string& option, const std::string& text)
{
    double value = 0.0;
    const auto [end, error] = std::from_chars(text.data(), text.data() + text.size(), value);
    if (error != std::errc() || end != text.data() + text.size() || !std::isfinite(value))
        throw UsageError(option + ": \"" + text + "\" is not a number");
    return value;
}

// --at-deg, --at-t or --at-peak into `at`; false for any other option.
bool takePosition(const OptionWord& o, ArgumentReader& in, PositionChoice& at, int& given)
{
    if (o.name == "--at-deg") at.degrees = parseNumber(o.name, in.valueOf(o.name, o.attached));
    else if (o.name == "--at-t") at.time = parseNumber(o.name, in.valueOf(o.name, o.attached));
    else if (o.name == "--at-peak") at.peakOfPin = in.valueOf(o.name, o.attached);
    else return false;
    ++given;
    return true;
}

Command parseInternalLoads(ArgumentReader& in)
{
    InternalLoadsOptions options;
    int positions = 0;
    while (!in.done()) {
        const std::string arg = in.take();
        if (isHelp(arg)) return HelpRequest{"internal-loads"};
        if (arg.size() > 1 && arg[0] == '-') {
            const OptionWord o = optionWord(arg);
            const std::string& name = o.name;
            if (takePosition(o, in, options.at, positions)) continue;
            if (name == "--body") options.body = in.valueOf(name, o.attached);
            else if (name == "--stations") options.stations = parseStations(in.valueOf(name, o.attached));
            else if (name == "--steps") options.steps = parseSteps(in.valueOf(name, o.attached));
            else if (name == "--json") options.jsonOut = in.valueOf(name, o.attached);
            else if (name == "--csv") options.csvOut = in.valueOf(name, o.attached);
            else throw UsageError("unknown option \"" + arg + "\" for internal-loads");
        } else if (options.file.empty()) options.file = arg;
        else throw UsageError("internal-loads takes one FILE; \"" + arg + "\" is a second one");
    }
    if (options.file.empty()) throw UsageError("internal-loads needs a mechanism FILE");
    if (options.body.empty()) throw UsageError("internal-loads needs --body NAME");
    if (positions != 1) throw UsageError("internal-loads needs exactly one of --at-deg, --at-t, --at-peak");
    return options;
}

// The lower-case suffix of a file name ("" if none).
std::string suffixOf(const std::string& path)
{
    const std::size_t dot = path.rfind('.'), slash = path.rfind('/');
    if (dot == std::string::npos || (slash != std::string::npos && dot < slash)) return "";
    std::string suffix = path.substr(dot + 1);
    for (char& c : suffix) c = char(std::tolower(static_cast<unsigned char>(c)));
    return suffix;
}

// The drawing commands' options; each command takes the ones its help lists.
Command parseDrawing(const std::string& command, Drawing drawing, ArgumentReader& in)
{
    const bool atPosition = drawing == Drawing::FreeBody || drawing == Drawing::BarDiagram;
    const bool bearing = drawing == Drawing::BearingPolar;
    DrawOptions options;
    options.drawing = drawing;
    int positions = 0;
    while (!in.done()) {
        const std::string arg = in.take();
        if (isHelp(arg)) return HelpRequest{command};
        if (arg.size() > 1 && arg[0] == '-') {
            const OptionWord o = optionWord(arg);
            const std::string& name = o.name;
            if (atPosition && takePosition(o, in, options.at, positions)) continue;
            if (name == "--out") options.out = in.valueOf(name, o.attached);
            else if (name == "--steps") options.steps = parseSteps(in.valueOf(name, o.attached));
            else if (name == "--body" && (atPosition || bearing)) options.body = in.valueOf(name, o.attached);
            else if (name == "--joint" && bearing) options.joint = in.valueOf(name, o.attached);
            else if (name == "--dalembert" && drawing == Drawing::FreeBody && !o.attached) options.dalembert = true;
            else throw UsageError("unknown option \"" + arg + "\" for " + command);
        } else if (options.file.empty()) options.file = arg;
        else throw UsageError(command + " takes one FILE; \"" + arg + "\" is a second one");
    }
    if (options.file.empty()) throw UsageError(command + " needs a mechanism FILE");
    if (options.out.empty()) throw UsageError("--out is missing");
    const std::string suffix = suffixOf(options.out);
    if (drawing == Drawing::Report) {
        if (suffix != "pdf") throw UsageError("--out " + options.out + ": the report is a .pdf file");
    } else if (suffix != "svg" && suffix != "pdf" && suffix != "png")
        throw UsageError("--out " + options.out + ": use a .svg, .pdf or .png file");
    if (atPosition && options.body.empty()) throw UsageError("--body is missing");
    if (bearing && options.joint.empty()) throw UsageError("--joint is missing");
    if (atPosition && positions != 1) throw UsageError("give exactly one of --at-deg, --at-t, --at-peak");
    return options;
}

}  // namespace

Command parseCommandLine(const std::vector<std::string>& args)
{
    ArgumentReader in(args);
    if (in.done()) throw UsageError("no command given");
    const std::string command = in.take();
    if (isHelp(command)) return HelpRequest{};
    if (command == "--version") return VersionRequest{};
    if (command == "analyze") return parseAnalyze(in);
    if (command == "internal-loads") return parseInternalLoads(in);
    if (command == "fbd") return parseDrawing(command, Drawing::FreeBody, in);
    if (command == "bar-diagram") return parseDrawing(command, Drawing::BarDiagram, in);
    if (command == "bearing-polar") return parseDrawing(command, Drawing::BearingPolar, in);
    if (command == "report") return parseDrawing(command, Drawing::Report, in);
    throw UsageError("unknown command \"" + command + "\"");
}

std::string helpText(const std::string& topic)
{
    if (topic == "analyze") return kAnalyzeHelp;
    if (topic == "internal-loads") return kInternalLoadsHelp;
    if (topic == "bar-diagram") return kBarDiagramHelp;
    if (topic == "fbd") return kFbdHelp;
    if (topic == "bearing-polar") return kBearingPolarHelp;
    if (topic == "report") return kReportHelp;
    return kOverview;
}

std::string usageErrorText(const std::vector<std::string>& args, const UsageError& error)
{
    const bool ownHelp = !args.empty() && helpText(args.front()) != kOverview;
    return "clevis-cli: " + std::string(error.what()) + "\nTry \"clevis-cli " + (ownHelp ? args.front() + " " : "") +
           "--help\".\n";
}

}  // namespace clevis::cli
