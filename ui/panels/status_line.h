// The status line: degrees of freedom, drivers and whether the mechanism
// solves, in plain words, kept current as the worker re-solves; beside it
// what the active tool expects next. Both are shortened to the window's
// width (the whole text is in their tooltips).
#pragma once

#include <QWidget>

class QLabel;

namespace clevis::ui {

class AnalysisState;
class ElidedLabel;

class StatusLine : public QWidget {
    Q_OBJECT
public:
    explicit StatusLine(AnalysisState* analysis, QWidget* parent = nullptr);
    QString analysisText() const;
    void showHint(const QString& hint);

private:
    void refresh();

    AnalysisState* analysis_;
    QLabel* mark_;
    ElidedLabel* state_;
    ElidedLabel* hint_;
};

// The sentence the status line shows for the analysis as it stands.
QString describeAnalysis(const AnalysisState& analysis);

}  // namespace clevis::ui
