#include "core/results/sizing_json.h"

#include "core/results/drive_units.h"

namespace clevis {
namespace {

using nlohmann::json;

json optional(const std::optional<double>& v) { return v ? json(*v) : json(nullptr); }

json sectionJson(const CompiledMechanism& m, const CycleResult& r, const BarEnvelope& e, const SectionSizing& s)
{
    json out = {{"width_m", s.width},
                {"thickness_m", s.thickness},
                {"area_m2", s.area},
                {"material", s.material.empty() ? json(nullptr) : json(s.material)},
                {"youngs_modulus_Pa", optional(s.youngsModulus)},
                {"yield_strength_Pa", optional(s.yieldStrength)},
                {"allowable_Pa", optional(s.allowable)},
                {"safety_factor", optional(s.safetyFactor)},
                {"fibre_tension", peakJson(m, r, e.fibreTension, "stress_Pa")},
                {"fibre_compression", peakJson(m, r, e.fibreCompression, "stress_Pa")},
                {"mean_shear", peakJson(m, r, s.shearStress, "stress_Pa")}};
    out["utilisation"] = nullptr;
    if (s.utilisation) {
        out["utilisation"] = peakJson(m, r, s.governing, "stress_Pa");
        if (out["utilisation"].is_null()) out["utilisation"] = json::object();
        out["utilisation"]["value"] = *s.utilisation;
    }
    out["buckling"] = {{"euler_in_plane_N", optional(s.eulerInPlane)},
                       {"euler_out_of_plane_N", optional(s.eulerOutOfPlane)},
                       {"compression_ratio", optional(s.bucklingRatio)},
                       {"slenderness", s.slenderness},
                       {"euler_limit_slenderness", optional(s.eulerLimit)}};
    return out;
}

// A pin peak's value under `key`, with its time, drive positions and flag;
// null when there is none.
json pinPeakJson(const CompiledMechanism& m, const CycleResult& r, const EnvelopePeak& p, const char* key)
{
    json out = peakJson(m, r, p, key);
    if (out.is_object()) out.erase("s_m");  // a pin has no station along a bar
    return out;
}

json pinDataJson(const PinSizing& p)
{
    if (!p.pin) return nullptr;
    return {{"diameter_m", p.pin->diameter},
            {"shear_planes", p.pin->shearPlanes},
            {"bearing_length_m", p.bearing ? json(p.bearing->length) : json(nullptr)},
            {"bearing_length_from_body",
             p.bearing && !p.bearing->fromBody.empty() ? json(p.bearing->fromBody) : json(nullptr)},
            {"allowable_shear_stress_Pa", optional(p.pin->allowableShear)},
            {"allowable_pressure_Pa", optional(p.pin->allowablePressure)},
            {"allowable_pv_Pa_m_s", optional(p.pin->allowablePv)}};
}

json pinJson(const CompiledMechanism& m, const CycleResult& r, const PinSizing& p)
{
    json pv = pinPeakJson(m, r, p.pv, "pv_Pa_m_s");
    if (pv.is_object()) pv["speed_m_s"] = p.speedAtPv;
    return {{"joint", p.name},
            {"pin", pinDataJson(p)},
            {"force", pinPeakJson(m, r, p.force, "force_N")},
            {"shear_stress", pinPeakJson(m, r, p.shearStress, "stress_Pa")},
            {"bearing_pressure", pinPeakJson(m, r, p.pressure, "pressure_Pa")},
            {"sliding_speed", pinPeakJson(m, r, p.slidingSpeed, "speed_m_s")},
            {"pv", pv},
            {"utilisation",
             {{"shear", optional(p.shearUtilisation)},
              {"pressure", optional(p.pressureUtilisation)},
              {"pv", optional(p.pvUtilisation)}}},
            {"notes", p.notes}};
}

}  // namespace

json drivePositionsJson(const CompiledMechanism& m, const StepResult& s)
{
    json out = json::object();
    for (std::size_t d = 0; d < m.drivers.size(); ++d)
        out[m.drivers[d].name] = {{"position", driveDisplayValue(m.drivers[d].type, s.drivePosition[d])},
                                  {"unit", driveDisplayUnit(m.drivers[d].type)}};
    return out;
}

json peakJson(const CompiledMechanism& m, const CycleResult& r, const EnvelopePeak& p, const char* key, double scale)
{
    if (p.step < 0) return nullptr;
    const StepResult& s = r.steps[std::size_t(p.step)];
    return {{key, p.value * scale},
            {"s_m", p.s},
            {"t", s.t},
            {"drive", drivePositionsJson(m, s)},
            {"near_singular", s.nearSingular}};
}

json sizingToJson(const CompiledMechanism& m, const CycleResult& r, const SizingResult& s)
{
    json bars = json::array();
    for (const BarSizing& b : s.bars) {
        const BarEnvelope& e = b.envelope;
        json bar = {{"body", b.name},
                    {"length_m", b.length},
                    {"tension", peakJson(m, r, e.tension, "axial_N")},
                    {"compression", peakJson(m, r, e.compression, "axial_N")},
                    {"shear", peakJson(m, r, e.shear, "shear_N")},
                    {"moment", peakJson(m, r, e.moment, "moment_Nm")},
                    {"section", b.section ? sectionJson(m, r, e, *b.section) : json(nullptr)},
                    {"notes", b.notes}};
        bars.push_back(std::move(bar));
    }
    json others = json::array();
    for (const NotABar& o : s.others) others.push_back({{"body", o.bodyName}, {"reason", o.reason}});
    // A cylinder's end pins in a list of their own: "pins" keeps the file's joints only.
    json pins = json::array(), ends = json::array();
    for (const PinSizing& p : s.pins) {
        if (p.joint >= 0) {
            pins.push_back(pinJson(m, r, p));
            continue;
        }
        json end = pinJson(m, r, p);
        end.erase("joint");
        end["end"] = p.name;
        ends.push_back(std::move(end));
    }
    json out = {{"bars", bars}, {"not_bars", others}, {"pins", pins}};
    if (!ends.empty()) out["cylinder_ends"] = ends;
    return out;
}

}  // namespace clevis
