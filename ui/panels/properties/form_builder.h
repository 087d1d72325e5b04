// Builds one property form: each row shows a value of the selected part in
// display units and, when edited, pushes one undo command on the document.
#pragma once

#include "core/model/mechanism.h"
#include "ui/panels/properties/display_quantity.h"

#include <QString>
#include <QStringList>

#include <functional>
#include <optional>

class QFormLayout;
class QWidget;

namespace clevis::ui {

class MechanismDocument;

class FormBuilder {
public:
    using Setter = std::function<void(Mechanism&, double si)>;
    // Told why a typed value was not taken (not a number, or refused by the
    // document); the form is then rebuilt with the value the document kept.
    using Refused = std::function<void(const QString& why)>;

    FormBuilder(QFormLayout* form, MechanismDocument* doc, Refused refused)
        : form_(form), doc_(doc), refused_(std::move(refused))
    {}

    // `undo` names the command, e.g. "Set crank mass". Object names (for
    // tests and accessibility) come from `key`.
    void number(const QString& key, const QString& label, double si, const DisplayQuantity& q, const QString& undo,
                Setter set);
    // An empty field means "not given" (nullopt); `placeholder` says what that
    // means (by default, "default").
    void optionalNumber(const QString& key, const QString& label, std::optional<double> si, const DisplayQuantity& q,
                        const QString& undo, std::function<void(Mechanism&, std::optional<double>)> set,
                        const QString& placeholder = {});
    // A list of numbers separated by commas or spaces.
    void numberList(const QString& key, const QString& label, const std::vector<double>& si, const DisplayQuantity& q,
                    const QString& undo, std::function<void(Mechanism&, std::vector<double>)> set);
    void text(const QString& key, const QString& label, const QString& value, const QString& undo,
              std::function<QString(Mechanism&, const QString&)> set);  // returns a problem, or empty
    void choice(const QString& key, const QString& label, const QStringList& options, int current, const QString& undo,
                std::function<void(Mechanism&, int)> set);
    void check(const QString& key, const QString& label, bool value, const QString& undo,
               std::function<void(Mechanism&, bool)> set);
    void info(const QString& label, const QString& value, const QString& key = {});
    void heading(const QString& title);
    // "Link crank", but "Link 2" for a part named "link 2": the kind is not said twice.
    void partHeading(const QString& kind, const QString& name);

    MechanismDocument* document() const { return doc_; }

private:
    QFormLayout* form_;
    MechanismDocument* doc_;
    Refused refused_;
};

// Reads a number typed by a person ("12.5", "12,5", "1e3"); nullopt if it is none.
std::optional<double> parseNumber(const QString& text);

}  // namespace clevis::ui
