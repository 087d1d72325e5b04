#include "tests/random_mechanism_check.h"

#include "core/file/mechanism_file.h"
#include "core/model/model_error.h"
#include "core/results/cycle_summary.h"
#include "core/results/results_csv.h"
#include "core/results/results_json.h"
#include "core/results/summary_text.h"
#include "core/solver/analysis_error.h"
#include "core/solver/constraint_system.h"
#include "core/solver/cycle_sweep.h"
#include "tests/step_laws.h"

#include <strings.h>
#include <Eigen/SVD>
#include <Eigen/SparseCore>

#include <algorithm>
#include <cmath>
#include <cstring>
#include <map>
#include <sstream>

namespace clevis::test {
namespace {

// Documented in docs/method.md (energy over the cycle) and summary_text.cpp.
constexpr double kEnergyTolerance = 1e-3;

class Rules {
public:
    explicit Rules(Verdict& v) : v_(v) {}
    // Records a broken rule (the first few of each kind, then a count).
    void broken(const std::string& kind, const std::string& detail)
    {
        if (++count_[kind] <= 2) v_.rules.push_back(kind + ": " + detail);
        else if (count_[kind] == 3) v_.rules.push_back(kind + ": (more)");
    }

private:
    Verdict& v_;
    std::map<std::string, int> count_;
};

bool allFinite(const Eigen::VectorXd& v) { return v.allFinite(); }
bool allFinite(const std::vector<double>& v)
{
    return std::all_of(v.begin(), v.end(), [](double x) { return std::isfinite(x); });
}

bool finiteStep(const StepResult& s)
{
    bool ok = std::isfinite(s.t) && allFinite(s.q) && allFinite(s.qd) && allFinite(s.qdd) && allFinite(s.lambda) &&
              allFinite(s.drivePosition) && allFinite(s.driveRate) && allFinite(s.effort) && allFinite(s.power) &&
              allFinite(s.transmissionDeg) && s.groundForce.allFinite() && std::isfinite(s.groundMoment) &&
              std::isfinite(s.kinetic) && std::isfinite(s.gravityPotential) && std::isfinite(s.springPotential) &&
              std::isfinite(s.damperDissipation) && std::isfinite(s.appliedPower) &&
              std::isfinite(s.reciprocalCondition);
    for (const Reaction& j : s.joints) ok = ok && j.force.allFinite() && std::isfinite(j.moment);
    for (const auto& side : s.actions)
        for (const ConstraintAction& a : side)
            ok = ok && a.at.allFinite() && a.force.allFinite() && std::isfinite(a.couple);
    return ok;
}

bool finitePeak(const Peak& p) { return std::isfinite(p.value) && std::isfinite(p.flagged.value); }

bool finiteSummary(const CycleSummary& s)
{
    bool ok = finitePeak(s.groundForce) && finitePeak(s.groundMoment);
    for (const auto& j : s.joints) ok = ok && finitePeak(j.peak) && std::isfinite(j.rms) && finitePeak(j.peakMoment);
    for (const auto& d : s.drivers)
        ok = ok && finitePeak(d.peak) && std::isfinite(d.rms) && std::isfinite(d.mean) && finitePeak(d.peakPower) &&
             finitePeak(d.peakRegenerative) && std::isfinite(d.work) && std::isfinite(d.workIn) &&
             std::isfinite(d.workOut);
    for (const auto& t : s.transmission) ok = ok && std::isfinite(t.minimum.value) && std::isfinite(t.maximum.value);
    const EnergyBalance& e = s.energy;
    return ok && std::isfinite(e.driverWork) && std::isfinite(e.kineticChange) && std::isfinite(e.gravityChange) &&
           std::isfinite(e.springChange) && std::isfinite(e.damperWork) && std::isfinite(e.loadWork) &&
           std::isfinite(e.residual) && std::isfinite(e.throughput) && std::isfinite(e.relativeResidual);
}

bool namesPart(const Mechanism& m, const std::string& item)
{
    const auto named = [&](const auto& parts) {
        return std::any_of(parts.begin(), parts.end(), [&](const auto& p) { return p.name == item; });
    };
    return named(m.bodies) || named(m.joints) || named(m.drivers);
}

// The kind of a refusal, from the wording of core/solver/mobility_check.cpp
// and cycle_sweep.cpp.
std::string refusalKind(const std::string& message)
{
    const auto has = [&](const char* words) { return message.find(words) != std::string::npos; };
    if (has("does not assemble")) return "does not assemble";
    if (has("Redundant constraint")) return "redundant joints";
    if (has("not driven")) return "under-driven";
    if (has("over-constrain")) return "over-driven";
    if (has("dead centre or toggle for driver")) return "toggle at the drawn pose";
    if (has("locked at the start")) return "locked at the start";
    return "other";
}

const char* expectedRefusal(Fault f)
{
    switch (f) {
    case Fault::DriverMissing: return "under-driven";
    case Fault::DriverAdded: return "over-driven";
    case Fault::RedundantLink: return "redundant joints";
    case Fault::StartedOutOfReach: return "does not assemble";
    case Fault::None: break;
    }
    return "";
}

bool wordCharacter(char c) { return std::isalnum(static_cast<unsigned char>(c)) || c == '_'; }

// The first "nan", "inf" or "n/a" (any case, signed or not) standing as a
// word in `text`: a number that is not one. A linear scan: the outputs of a
// large machine run to tens of megabytes.
std::string nonNumberWord(const std::string& text)
{
    for (const char* word : {"nan", "inf", "n/a"}) {
        const std::size_t n = std::strlen(word);
        for (std::size_t at = 0; at + n <= text.size(); ++at) {
            if (strncasecmp(text.data() + at, word, n) != 0) continue;
            const bool before = at == 0 || !wordCharacter(text[at - 1]);
            const bool after = at + n == text.size() || !wordCharacter(text[at + n]);
            if (before && after) return text.substr(at > 0 && text[at - 1] == '-' ? at - 1 : at, n + 1);
        }
    }
    return "";
}

// Keys docs/results-format.md allows to be null ("no such step", "no larger
// value at an unreliable step", "no joint between the two bodies").
bool mayBeNull(const std::string& key)
{
    const auto endsWith = [&](const std::string& end) {
        return key.size() >= end.size() && key.compare(key.size() - end.size(), end.size(), end) == 0;
    };
    return key == "step" || key == "joint" || endsWith("_step") || endsWith("_near_toggle");
}

// The keys of nulls where a number belongs (the JSON writer writes a number
// that is not finite as null), by one pass over the text: the key of a value
// is the last string followed by a colon (for an array's elements, the
// array's key).
std::vector<std::string> nullNumbers(const std::string& json)
{
    std::vector<std::string> keys;
    std::string key, last;
    for (std::size_t i = 0; i < json.size() && keys.size() < 3; ++i) {
        const char c = json[i];
        if (c == '"') {
            std::size_t end = i + 1;
            while (end < json.size() && json[end] != '"') end += json[end] == '\\' ? 2 : 1;
            last = json.substr(i + 1, end - i - 1);
            i = end;
        } else if (c == ':') {
            key = last;
        } else if (json.compare(i, 4, "null") == 0) {
            if (!mayBeNull(key)) keys.push_back(key);
            i += 3;
        }
    }
    return keys;
}

void checkOutputs(const CompiledMechanism& cm, const CycleResult& r, const CycleSummary& summary, Rules& rules)
{
    if (const auto word = nonNumberWord(summaryText(cm, r, summary)); !word.empty())
        rules.broken("summary text holds a non-number", word);
    if (const auto word = nonNumberWord(resultsCsvText(cm, r)); !word.empty())
        rules.broken("CSV holds a non-number", word);
    for (const auto& key : nullNumbers(resultsJsonText(cm, r, summary))) rules.broken("JSON holds null", key);
}

// The laws of tests/step_laws.h at a reliable step, and each driver's power
// as its effort times its rate.
void checkLaws(const CompiledMechanism& cm, const StepResult& s, int step, Rules& rules)
{
    const std::string at = "step " + std::to_string(step) + ": ";
    for (const auto& breach : newtonEulerBreaches(cm, s)) rules.broken("a body is not in equilibrium", at + breach);
    for (const auto& breach : powerBalanceBreaches(cm, s)) rules.broken("power does not balance", at + breach);
    for (std::size_t d = 0; d < s.power.size(); ++d) {
        const double p = s.effort[d] * s.driveRate[d];
        if (std::abs(p - s.power[d]) > kPowerTolerance * std::abs(p) + kFloor)
            rules.broken("a driver's power is not effort × rate", at + cm.drivers[d].name);
    }
}

// The dense check of an ill-conditioned step (small mechanisms only).
void checkFlags(const CompiledMechanism& cm, const CycleResult& r, const std::vector<bool>& unreliable, Rules& rules)
{
    // The measure's own threshold is 10⁻³, lowered in proportion for a block
    // of more than ten bodies; below the lowest it can be, a step is flagged.
    const double lowest = 1e-3 * std::min(1.0, 10.0 / double(cm.bodies.size()));
    for (std::size_t i = 0; i < r.steps.size(); ++i)
        if (r.steps[i].reciprocalCondition < lowest && !r.steps[i].nearSingular)
            rules.broken("an ill-conditioned step is not flagged",
                         "step " + std::to_string(i) + ", μ = " + std::to_string(r.steps[i].reciprocalCondition));
    if (cm.bodies.size() > kDenseConditionBodies) return;
    const ConstraintSystem system(cm);
    if (system.rows() != system.coordinates()) return;
    Eigen::VectorXd phi(system.rows());
    std::vector<Eigen::Triplet<double>> entries;
    for (std::size_t i = 0; i < r.steps.size(); ++i) {
        if (unreliable[i]) continue;
        entries.clear();
        system.position(Pose(r.steps[i].q), r.steps[i].t, phi, &entries);
        Eigen::SparseMatrix<double> sparse(system.rows(), system.coordinates());
        sparse.setFromTriplets(entries.begin(), entries.end());
        const Eigen::JacobiSVD<Eigen::MatrixXd> svd{Eigen::MatrixXd(sparse)};
        const auto& sv = svd.singularValues();
        const double ratio = sv[sv.size() - 1] / sv[0];
        if (ratio < kUnflaggedConditionLimit)
            rules.broken("an ill-conditioned step is not flagged",
                         "step " + std::to_string(i) + ", σ_min/σ_max = " + std::to_string(ratio));
    }
}

// Over a complete cycle with no unreliable step the energy balance closes
// to 0.1 % (docs/method.md), or the summary says it does not. It may not: a
// link that whips round near the end of its reach makes a spike of power
// that the trapezoid rule does not resolve at the cycle's steps, though
// every step obeys its laws.
void checkEnergy(const CompiledMechanism& cm, const CycleResult& r, const CycleSummary& s, Verdict& v, Rules& rules)
{
    double work = 0.0;
    for (const auto& d : s.drivers) work += d.work;
    if (std::abs(work - s.energy.driverWork) > 1e-9 * (std::abs(work) + s.energy.throughput) + kFloor)
        rules.broken("the drivers' work differs from the balance's", std::to_string(work));
    if (!r.complete || s.nearSingularSteps > 0) return;
    v.relativeResidual = s.energy.relativeResidual;
    if (s.energy.relativeResidual <= kEnergyTolerance) return;
    v.energyWarned = true;
    if (summaryText(cm, r, s).find("That is more than rounding") == std::string::npos)
        rules.broken("an energy balance above 0.1 % goes unsaid", std::to_string(s.energy.relativeResidual));
}

void checkSolved(const RandomMechanism& rm, const CompiledMechanism& cm, const CycleResult& r, Verdict& v, Rules& rules)
{
    v.steps = int(r.steps.size());
    if (r.steps.empty()) return rules.broken("no steps", "a result without a single step");
    for (std::size_t i = 0; i < r.steps.size(); ++i)
        if (!finiteStep(r.steps[i])) rules.broken("a step holds a non-number", "step " + std::to_string(i));
    const CycleSummary summary = summarize(cm, r);
    if (!finiteSummary(summary)) rules.broken("the summary holds a non-number", "");
    v.flaggedSteps = summary.nearSingularSteps;
    const auto coded = [&](const char* code) {
        return std::find_if(r.warnings.begin(), r.warnings.end(), [&](const Warning& w) { return w.code == code; });
    };
    if (!r.complete) {
        v.outcome = Outcome::CannotComplete;
        v.diagnosis = "cannot complete";
        if (coded("out_of_reach") == r.warnings.end()) rules.broken("a cycle stops short silently", "");
    } else {
        v.outcome = summary.nearSingularSteps > 0 ? Outcome::SolvedFlagged : Outcome::Solved;
        if (r.steps.size() != std::size_t(r.plannedSteps + 1)) rules.broken("a complete cycle lacks steps", "");
    }
    const bool anyFlagged =
        std::any_of(r.steps.begin(), r.steps.end(), [](const StepResult& s) { return s.nearSingular; });
    if (anyFlagged) {
        if (v.diagnosis.empty()) v.diagnosis = "toggle";
        if (coded("near_singular") == r.warnings.end()) rules.broken("flagged steps without a warning", "");
    }
    if (summary.nearSingularSteps > 0) {
        if (summary.toggles.empty()) rules.broken("unreliable steps without a part named", "");
        for (const NearToggle& t : summary.toggles)
            if (t.bodies[0] == kGround || toggleText(cm, t).empty())
                rules.broken("a toggle names no part",
                             "steps " + std::to_string(t.first) + "–" + std::to_string(t.last));
    }
    for (std::size_t i = 0; i < r.steps.size(); ++i)
        if (!summary.unreliable[i]) checkLaws(cm, r.steps[i], int(i), rules);
    checkFlags(cm, r, summary.unreliable, rules);
    checkEnergy(cm, r, summary, v, rules);
    checkOutputs(cm, r, summary, rules);
    if (rm.fault != Fault::None) rules.broken("a fault put in on purpose was not refused", faultName(rm.fault));
    if (rm.completes && !r.complete)
        rules.broken("a mechanism that turns fully is stopped", r.warnings.empty() ? "" : r.warnings.back().message);
}

void checkRefusal(const RandomMechanism& rm, const AnalysisError& e, Verdict& v, Rules& rules)
{
    v.outcome = Outcome::Refused;
    v.diagnosis = refusalKind(e.what());
    if (std::string(e.what()).empty()) rules.broken("a refusal without a message", "");
    if (e.items().empty()) rules.broken("a refusal names no part", e.what());
    for (const auto& item : e.items())
        if (!namesPart(rm.mechanism, item)) rules.broken("a refusal names a part that does not exist", item);
    if (rm.completes) rules.broken("a mechanism that turns fully is refused", e.what());
    if (rm.fault != Fault::None && v.diagnosis != expectedRefusal(rm.fault))
        rules.broken("a fault put in on purpose is misnamed", std::string(faultName(rm.fault)) + ": " + e.what());
}

}  // namespace

const char* outcomeName(Outcome o)
{
    switch (o) {
    case Outcome::Solved: return "solved";
    case Outcome::SolvedFlagged: return "solved, toggle flagged";
    case Outcome::CannotComplete: return "cannot complete";
    case Outcome::Refused: return "refused";
    case Outcome::Broken: return "broken";
    }
    return "?";
}

Verdict checkResult(const RandomMechanism& rm, const CompiledMechanism& cm, const CycleResult& r)
{
    Verdict v;
    Rules rules(v);
    checkSolved(rm, cm, r, v, rules);
    return v;
}

Verdict checkMechanism(const RandomMechanism& rm)
{
    Verdict v;
    Rules rules(v);
    try {
        validateMechanism(rm.mechanism);
    } catch (const ModelError& e) {
        rules.broken("the file reader refuses a generated mechanism", e.what());
        return v;
    }
    try {
        const CompiledMechanism cm = compile(rm.mechanism);
        try {
            const CycleResult r = sweepCycle(cm);
            return checkResult(rm, cm, r);
        } catch (const AnalysisError& e) {
            checkRefusal(rm, e, v, rules);
        }
    } catch (const std::exception& e) {
        v.outcome = Outcome::Broken;
        rules.broken("unexpected exception", e.what());
    }
    return v;
}

}  // namespace clevis::test
