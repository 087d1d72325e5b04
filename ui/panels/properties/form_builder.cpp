#include "ui/panels/properties/form_builder.h"

#include "render/render_units.h"
#include "ui/document/mechanism_document.h"

#include <QCheckBox>
#include <QComboBox>
#include <QFormLayout>
#include <QHBoxLayout>
#include <QLabel>
#include <QLineEdit>
#include <QLocale>
#include <QRegularExpression>

#include <cmath>

namespace clevis::ui {
namespace {

QString show(double si, const DisplayQuantity& q)
{
    double v = q.fromSi(si);
    if (std::abs(v) < 0.5 * std::pow(10.0, -q.decimals)) v = 0.0;  // never "-0.00"
    return QString::number(v, 'f', q.decimals);
}

// Wide enough for `widest`: a narrow panel must never show "850.0" of
// 7850.0, nor "tor 1" of a name (the form puts the field under its label
// instead, and the panel scrolls sideways if even that is too narrow).
void fitWidth(QLineEdit* edit, const QString& widest)
{
    edit->setMinimumWidth(edit->fontMetrics().horizontalAdvance(widest) + 2 * edit->fontMetrics().averageCharWidth() +
                          8);
}

// A line edit with its unit after it, so every number on screen carries one.
QLineEdit* withUnit(QFormLayout* form, const QString& key, const QString& label, const QString& value,
                    const QString& unit)
{
    auto* row = new QWidget;
    auto* layout = new QHBoxLayout(row);
    layout->setContentsMargins(0, 0, 0, 0);
    auto* edit = new QLineEdit(value);
    edit->setObjectName(key);
    edit->setAlignment(Qt::AlignRight);
    fitWidth(edit, value.size() > 7 ? value : QStringLiteral("0000.000"));
    layout->addWidget(edit, 1);
    auto* u = new QLabel(unit);
    u->setMinimumWidth(44);
    layout->addWidget(u);
    form->addRow(label, row);
    return edit;
}

// The document checks the edited mechanism by the file's rules and says why
// when it refuses; the form then shows the reason and the value it kept.
void commit(MechanismDocument* doc, const QString& undo, const std::function<void(Mechanism&)>& set,
            const FormBuilder::Refused& refused)
{
    if (const QString why = doc->apply(undo, set); !why.isEmpty()) refused(why);
}

}  // namespace

std::optional<double> parseNumber(const QString& text)
{
    QString t = text.trimmed();
    t.replace(QChar(','), QChar('.'));
    bool ok = false;
    const double v = QLocale::c().toDouble(t, &ok);
    if (!ok || !std::isfinite(v)) return std::nullopt;
    return v;
}

void FormBuilder::number(const QString& key, const QString& label, double si, const DisplayQuantity& q,
                         const QString& undo, Setter set)
{
    const QString shown = show(si, q);
    QLineEdit* edit = withUnit(form_, key, label, shown, q.unit);
    QObject::connect(edit, &QLineEdit::editingFinished, edit, [=, doc = doc_, refused = refused_] {
        if (edit->text() == shown) return;
        const auto v = parseNumber(edit->text());
        if (!v) return refused(QObject::tr("Type a number in %1.").arg(q.unit));
        const double value = q.toSi(*v);
        commit(
            doc, undo, [&](Mechanism& m) { set(m, value); }, refused);
    });
}

void FormBuilder::optionalNumber(const QString& key, const QString& label, std::optional<double> si,
                                 const DisplayQuantity& q, const QString& undo,
                                 std::function<void(Mechanism&, std::optional<double>)> set, const QString& placeholder)
{
    const QString shown = si ? show(*si, q) : QString();
    QLineEdit* edit = withUnit(form_, key, label, shown, q.unit);
    const QString empty = placeholder.isEmpty() ? QObject::tr("default") : placeholder;
    edit->setPlaceholderText(empty);
    QObject::connect(edit, &QLineEdit::editingFinished, edit, [=, doc = doc_, refused = refused_] {
        if (edit->text() == shown) return;
        std::optional<double> value;
        if (!edit->text().trimmed().isEmpty()) {
            const auto v = parseNumber(edit->text());
            if (!v) return refused(QObject::tr("Type a number in %1, or leave it empty (%2).").arg(q.unit, empty));
            value = q.toSi(*v);
        }
        commit(
            doc, undo, [&](Mechanism& m) { set(m, value); }, refused);
    });
}

void FormBuilder::numberList(const QString& key, const QString& label, const std::vector<double>& si,
                             const DisplayQuantity& q, const QString& undo,
                             std::function<void(Mechanism&, std::vector<double>)> set)
{
    QStringList parts;
    for (double v : si) parts << show(v, q);
    const QString shown = parts.join(QStringLiteral("  "));
    QLineEdit* edit = withUnit(form_, key, label, shown, q.unit);
    QObject::connect(edit, &QLineEdit::editingFinished, edit, [=, doc = doc_, refused = refused_] {
        if (edit->text() == shown) return;
        std::vector<double> values;
        for (const QString& token :
             edit->text().split(QRegularExpression(QStringLiteral("[\\s;]+")), Qt::SkipEmptyParts)) {
            const auto v = parseNumber(token);
            if (!v) return refused(QObject::tr("\"%1\" is not a number.").arg(token));
            values.push_back(q.toSi(*v));
        }
        commit(
            doc, undo, [&](Mechanism& m) { set(m, values); }, refused);
    });
}

void FormBuilder::text(const QString& key, const QString& label, const QString& value, const QString& undo,
                       std::function<QString(Mechanism&, const QString&)> set)
{
    auto* edit = new QLineEdit(value);
    edit->setObjectName(key);
    fitWidth(edit, value.size() > 12 ? value.left(24) : QStringLiteral("Wwwwwwwwwwww"));
    edit->setCursorPosition(0);  // a name longer than the field shows its start
    form_->addRow(label, edit);
    QObject::connect(edit, &QLineEdit::editingFinished, edit, [=, doc = doc_, refused = refused_] {
        const QString typed = edit->text().trimmed();
        if (typed == value) return;
        Mechanism trial = doc->mechanism();
        const QString problem = set(trial, typed);
        if (!problem.isEmpty()) return refused(problem);
        const Selection renamed = doc->selection();
        if (const QString why = doc->apply(undo, [&trial](Mechanism& m) { m = trial; }); !why.isEmpty())
            return refused(why);
        // The selection names the part: follow it to its new name.
        if (renamed.kind != Selection::Kind::None && renamed.name == value)
            doc->setSelection({renamed.kind, typed, renamed.loadIndex});
    });
}

void FormBuilder::choice(const QString& key, const QString& label, const QStringList& options, int current,
                         const QString& undo, std::function<void(Mechanism&, int)> set)
{
    auto* box = new QComboBox;
    box->setObjectName(key);
    box->addItems(options);
    box->setCurrentIndex(current);
    form_->addRow(label, box);
    QObject::connect(box, &QComboBox::activated, box, [=, doc = doc_, refused = refused_](int index) {
        if (index == current) return;
        commit(
            doc, undo, [&](Mechanism& m) { set(m, index); }, refused);
    });
}

void FormBuilder::check(const QString& key, const QString& label, bool value, const QString& undo,
                        std::function<void(Mechanism&, bool)> set)
{
    auto* box = new QCheckBox;
    box->setObjectName(key);
    box->setChecked(value);
    form_->addRow(label, box);
    QObject::connect(box, &QCheckBox::toggled, box, [=, doc = doc_, refused = refused_](bool on) {
        commit(
            doc, undo, [&](Mechanism& m) { set(m, on); }, refused);
    });
}

void FormBuilder::info(const QString& label, const QString& value, const QString& key)
{
    auto* l = new QLabel(value);
    l->setObjectName(key);
    l->setTextInteractionFlags(Qt::TextSelectableByMouse);
    l->setWordWrap(true);
    form_->addRow(label, l);
}

void FormBuilder::partHeading(const QString& kind, const QString& name) { heading(partLabel(kind, name)); }

void FormBuilder::heading(const QString& title)
{
    auto* l = new QLabel(QStringLiteral("<b>%1</b>").arg(title.toHtmlEscaped()));
    l->setContentsMargins(0, 8, 0, 2);
    form_->addRow(l);
}

}  // namespace clevis::ui
