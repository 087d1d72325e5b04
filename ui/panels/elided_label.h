// A one-line label that shortens its text with "…" to the width it is given,
// so a long message never makes the window wider. The whole text is in the
// tooltip.
#pragma once

#include <QLabel>

namespace clevis::ui {

class ElidedLabel : public QLabel {
    Q_OBJECT
public:
    explicit ElidedLabel(QWidget* parent = nullptr);

    void setFullText(const QString& text);
    QSize minimumSizeHint() const override;

protected:
    void paintEvent(QPaintEvent*) override;
};

}  // namespace clevis::ui
