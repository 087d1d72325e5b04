// A paint device that keeps what is drawn on it instead of pixels: each text
// run (what it says, where, its box from ascent to descent and the size its
// font comes out at, all in device units after the painter's transform) and
// each straight line with its pen. Tests read layouts from it: overlaps,
// text sizes, line samples.
#pragma once

#include <QPaintDevice>
#include <QPaintEngine>
#include <QPen>
#include <QTextItem>
#include <QTransform>

#include <climits>
#include <cmath>
#include <vector>

namespace clevis::test {

struct RecordedText {
    QString text;
    QPointF at;     // baseline start
    QRectF box;     // ascent to descent
    double pixels;  // the font's size
};

struct RecordedLine {
    QLineF line;
    QPen pen;
};

class RecordingEngine final : public QPaintEngine {
public:
    RecordingEngine() : QPaintEngine(QPaintEngine::AllFeatures) {}
    bool begin(QPaintDevice*) override { return true; }
    bool end() override { return true; }
    void updateState(const QPaintEngineState& state) override
    {
        if (state.state() & DirtyTransform) transform_ = state.transform();
        if (state.state() & DirtyPen) pen_ = state.pen();
    }
    void drawPixmap(const QRectF&, const QPixmap&, const QRectF&) override {}
    // Only texts and straight lines are kept; the engine's own drawPolygon overloads call each other.
    void drawPath(const QPainterPath&) override {}
    using QPaintEngine::drawPolygon;
    void drawPolygon(const QPointF*, int, PolygonDrawMode) override {}
    void drawTextItem(const QPointF& at, const QTextItem& item) override
    {
        const QFont f = item.font();
        const double pixels = f.pixelSize() > 0 ? f.pixelSize() : f.pointSizeF() * dpi / 72;
        const QRectF box(at.x(), at.y() - item.ascent(), item.width(), item.ascent() + item.descent());
        texts.push_back({item.text(), transform_.map(at), transform_.mapRect(box),
                         pixels * std::sqrt(std::abs(transform_.determinant()))});
    }
    void drawLines(const QLineF* l, int count) override
    {
        for (int i = 0; i < count; ++i) lines.push_back({transform_.map(l[i]), pen_});
    }
    Type type() const override { return QPaintEngine::User; }

    int dpi = 72;
    std::vector<RecordedText> texts;
    std::vector<RecordedLine> lines;

private:
    QTransform transform_;
    QPen pen_;
};

// The runs of one text drawn in pieces (a font shapes Greek letters and
// symbols as runs of their own) joined again: a run that starts on the same
// baseline where the one before it ended.
inline std::vector<RecordedText> joinedRuns(const std::vector<RecordedText>& texts)
{
    std::vector<RecordedText> joined;
    for (const RecordedText& t : texts) {
        if (!joined.empty()) {
            RecordedText& last = joined.back();
            if (std::abs(last.at.y() - t.at.y()) < 0.5 && std::abs(last.box.right() - t.box.left()) < 1.0) {
                last.text += t.text;
                last.box |= t.box;
                continue;
            }
        }
        joined.push_back(t);
    }
    return joined;
}

class RecordingDevice final : public QPaintDevice {
public:
    explicit RecordingDevice(QSize size, int dpi = 72) : size_(size) { engine.dpi = dpi; }
    QPaintEngine* paintEngine() const override { return &engine; }
    mutable RecordingEngine engine;

protected:
    int metric(PaintDeviceMetric m) const override
    {
        switch (m) {
        case PdmWidth: return size_.width();
        case PdmHeight: return size_.height();
        case PdmWidthMM: return size_.width() * 254 / (10 * engine.dpi);
        case PdmHeightMM: return size_.height() * 254 / (10 * engine.dpi);
        case PdmDpiX:
        case PdmDpiY:
        case PdmPhysicalDpiX:
        case PdmPhysicalDpiY: return engine.dpi;
        case PdmDepth: return 32;
        case PdmNumColors: return INT_MAX;
        case PdmDevicePixelRatio: return 1;
        case PdmDevicePixelRatioScaled: return int(devicePixelRatioFScale());
        default: return QPaintDevice::metric(m);
        }
    }

private:
    QSize size_;
};

}  // namespace clevis::test
