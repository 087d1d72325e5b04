// The property forms, one per kind of part; each fills a FormBuilder from
// the mechanism as it is now.
#pragma once

#include "ui/panels/properties/form_builder.h"

namespace clevis::ui {

void mechanismForm(FormBuilder& f, const Mechanism& m);
void bodyForm(FormBuilder& f, const Mechanism& m, const Body& body);
class AnalysisState;
// With a solved analysis, a compound pin's form lists each of its joints' forces.
void jointForm(FormBuilder& f, const Mechanism& m, const Joint& joint, const AnalysisState* analysis);
// Whether the joint's form shows solved values (the forces at a compound
// pin), and so must be built again when a result or the shown step changes.
bool jointFormShowsResults(const Mechanism& m, const Joint& joint);
void driverForm(FormBuilder& f, const Mechanism& m, const Driver& driver);
void loadForm(FormBuilder& f, const Mechanism& m, int loadIndex);

// Why `name` cannot be given to a part (empty, "ground", or taken), or empty.
QString nameProblem(const Mechanism& m, const QString& name);

// The position fields of a point on a body, e.g. a spring's end.
void pointFields(FormBuilder& f, const QString& key, const QString& label, const Vec2& at, const QString& undo,
                 std::function<Vec2&(Mechanism&)> point);

}  // namespace clevis::ui
