// Clevis's drawing palette, shared by the canvas, the plots, the free-body
// diagrams and the exports. Hues are taken from the Okabe–Ito set, which
// stays distinguishable for the common forms of colour-blindness and in
// grey-scale print; each role also differs by line style or shape, never by
// colour alone.
#pragma once

#include <QColor>
#include <QVector>

namespace clevis::ui::palette {

inline QColor paper() { return {0xFB, 0xFA, 0xF7}; }  // canvas and diagram background
inline QColor gridMinor() { return {0xEC, 0xEA, 0xE4}; }
inline QColor gridMajor() { return {0xDA, 0xD7, 0xCE}; }
inline QColor ink() { return {0x22, 0x22, 0x22}; }  // outlines, text, joint reactions
inline QColor groundHatch() { return {0x6B, 0x6B, 0x6B}; }
inline QColor link() { return {0x00, 0x72, 0xB2}; }  // blue: moving bodies
inline QColor linkFill() { return {0xD6, 0xE9, 0xF5}; }
inline QColor driver() { return {0xD5, 0x5E, 0x00}; }     // vermillion: motors and cylinders, drive effort
inline QColor load() { return {0x00, 0x9E, 0x73}; }       // bluish green: applied forces and torques
inline QColor spring() { return {0xCC, 0x79, 0xA7}; }     // reddish purple: springs and dampers
inline QColor weight() { return {0xE6, 0x9F, 0x00}; }     // orange: gravity
inline QColor inertia() { return {0x56, 0xB4, 0xE9}; }    // sky blue, dashed: m·a_G, I_G·α
inline QColor selection() { return {0xF0, 0xE4, 0x42}; }  // yellow halo behind the selected part
inline QColor problem() { return {0xB0, 0x00, 0x20}; }    // the part an error names

// The background of a utilisation figure (window and report alike): the
// nearer the part is to its limit, the deeper the shade of one hue
// (vermillion), so the order reads in grey-scale print and without telling
// hues apart. Far from the limit there is little shade; at or over it the
// deepest, still light enough for black text.
inline QColor utilisationShade(double utilisation)
{
    const double t = utilisation < 0.0 ? 0.0 : (utilisation > 1.0 ? 1.0 : utilisation);
    const double mix = 0.65 * t * t;
    const QColor deep(0xD5, 0x5E, 0x00);
    return QColor::fromRgbF(float(1.0 - mix * (1.0 - deep.redF())), float(1.0 - mix * (1.0 - deep.greenF())),
                            float(1.0 - mix * (1.0 - deep.blueF())));
}

// The style of the n-th curve on a chart (window and report alike): a colour
// of the Okabe–Ito set (its yellow is left out, too pale on white) and a dash pattern, in pen widths, empty for a solid
// line. The twelve styles differ pairwise in colour or dash, consecutive
// ones in both; two styles with one dash differ by at least 20 in CIE L* (a
// threshold of our choosing), so a dozen curves stay apart in grey-scale
// print. Curves past the twelfth repeat the styles.
struct CurveStyle {
    QColor colour;
    QVector<qreal> dashes;
};

inline constexpr int kCurveStyles = 12;

inline CurveStyle curveStyle(int index)
{
    const QColor black(0x00, 0x00, 0x00), orange(0xE6, 0x9F, 0x00), skyBlue(0x56, 0xB4, 0xE9),
        bluishGreen(0x00, 0x9E, 0x73), blue(0x00, 0x72, 0xB2), vermillion(0xD5, 0x5E, 0x00),
        reddishPurple(0xCC, 0x79, 0xA7);
    const QVector<qreal> solid, dash{5, 3}, dot{1, 2.5}, dashDot{5, 2.5, 1, 2.5}, longDash{11, 3.5},
        dashDotDot{5, 2.5, 1, 2.5, 1, 2.5};
    const CurveStyle styles[kCurveStyles] = {{black, solid},         {vermillion, dash}, {blue, dot},
                                             {bluishGreen, dashDot}, {orange, longDash}, {reddishPurple, dashDotDot},
                                             {skyBlue, solid},       {black, dash},      {orange, dot},
                                             {black, dashDot},       {blue, longDash},   {black, dashDotDot}};
    return styles[((index % kCurveStyles) + kCurveStyles) % kCurveStyles];
}

}  // namespace clevis::ui::palette
