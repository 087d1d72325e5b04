// The points a body's drawing must reach: where it is joined (pins, slider
// blocks, the guides and slots it carries), where a cylinder ends on it, where
// loads act (a ram's die face, a spring's lug), its point masses and its
// centre of mass (a bed's load, a counterweight). The canvas, the free-body
// diagrams and the mechanism sketch all draw a body round these.
#pragma once

#include "core/model/mechanism.h"

#include <optional>
#include <string>
#include <utility>
#include <vector>

namespace clevis {

enum class BodyPointKind { Pin, SlideBlock, SlideGuide, CylinderEnd, LoadPoint, PointMass, Centre };

struct BodyPointOf {
    BodyPointKind kind = BodyPointKind::Pin;
    Vec2 at = Vec2::Zero();       // m, global
    Vec2 axis = Vec2::Zero();     // blocks and guides: unit slide direction, global
    Vec2 sliding = Vec2::Zero();  // guides: where the block or pin running on it is

    bool isJoint() const
    {
        return kind == BodyPointKind::Pin || kind == BodyPointKind::SlideBlock || kind == BodyPointKind::SlideGuide;
    }
};

// The kind of a joint's point on its first (side 0) or second (side 1) body.
BodyPointKind jointPointKind(JointType type, int side);

// At the drawn pose, in document order: joints (once each), cylinder ends,
// load points, point masses, then the centre of mass where one is given.
std::vector<BodyPointOf> bodyPoints(const Mechanism& m, const std::string& body);

// Joint points on a body, in document order, each point once: the joints of a
// compound pin (several at one point) make one pin of the body.
std::vector<Vec2> bodyPins(const Mechanism& m, const std::string& body);

// Where a body is joined to others, at the drawn pose: its joint points and
// the cylinder ends on it, in document order.
std::vector<Vec2> bodyAttachments(const Mechanism& m, const std::string& body);

// The ends of a body's bar section: as given, or else its two farthest-apart
// attachments (the first such pair in document order). None without a
// section, or with fewer than two attachments and no ends given.
std::optional<std::pair<Vec2, Vec2>> sectionEnds(const Mechanism& m, const Body& body);

}  // namespace clevis
