#include "render/bearing_polar_report.h"

#include "render/bearing_polar_diagram.h"

#include <QPainter>

#include <memory>

namespace clevis::ui {
namespace {

constexpr double kGap = 14;  // between two diagrams of a row, pt

// Figures side by side at one height, with a gap between them.
class FigureRow final : public Figure {
public:
    explicit FigureRow(std::vector<const Figure*> figures) : figures_(std::move(figures)) {}

    QSizeF size() const override
    {
        double width = kGap * (figures_.size() - 1), height = 0;
        for (const Figure* f : figures_) height = std::max(height, f->size().height());
        for (const Figure* f : figures_) width += f->size().width() * height / f->size().height();
        return {width, height};
    }

    void paint(QPainter& p, const QRectF& target) const override
    {
        p.save();
        const QSizeF all = size();
        fitFigure(p, all, target);
        double left = 0;
        for (const Figure* f : figures_) {
            const double width = f->size().width() * all.height() / f->size().height();
            f->paint(p, QRectF(left, 0, width, all.height()));
            left += width + kGap;
        }
        p.restore();
    }

private:
    std::vector<const Figure*> figures_;
};

}  // namespace

BearingPolarDiagrams bearingPolarDiagrams(const ReviewReportInput& in)
{
    const auto& m = in.mechanism;
    BearingPolarDiagrams diagrams;
    for (std::size_t j = 0; j < m.joints.size(); ++j) {
        const auto& joint = m.joints[j];
        if (joint.type != JointType::Pin) continue;
        const int body = joint.body[1] == kGround ? joint.body[0] : joint.body[1];
        diagrams.push_back(std::make_unique<BearingPolarDiagram>(
            m, in.result, bearingPolar(m, in.result, in.summary, int(j), body), BearingPolarOptions{in.units}));
    }
    // A cylinder's ends on the body there, after the joints.
    for (std::size_t e = 0; e < in.summary.cylinderEnds.size(); ++e)
        diagrams.push_back(std::make_unique<BearingPolarDiagram>(
            m, in.result, endBearingPolar(m, in.result, in.summary, int(e)), BearingPolarOptions{in.units}));
    return diagrams;
}

bool bearingPolarPages(PageFlow& f, const BearingPolarDiagrams& diagrams, const std::function<bool()>& advance)
{
    f.subheading("Bearing loads in the body frame");
    if (diagrams.empty()) {
        f.paragraph("The mechanism has no pin joints.");
        return true;
    }
    f.paragraph(
        "The load each pin puts on a body over the whole cycle, drawn in that body's own frame: the curve "
        "the tip of the force traces, the drive position marked along it and the peak labelled. A load "
        "confined to a sector leaves the rest of the bore unloaded (a place for an oil hole or a split); "
        "one that sweeps 180° or more reverses on the bearing. A pin between two moving bodies is shown "
        "in its second body's frame; a pin on the frame in the moving body's; a cylinder's end on the body "
        "there.");
    for (std::size_t k = 0; k < diagrams.size(); k += 2) {
        if (!advance()) return false;
        std::vector<const Figure*> row{diagrams[k].get()};
        if (k + 1 < diagrams.size()) row.push_back(diagrams[k + 1].get());
        // A lone last diagram keeps the width it has beside another.
        const double width = row.size() == 2 ? f.width() : (f.width() - kGap) / 2;
        f.figure(FigureRow(row), width);
    }
    return true;
}

}  // namespace clevis::ui
