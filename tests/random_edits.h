// Random edits of an open document as the drawing tools, the property editor
// and the Edit menu make them (through MechanismDocument::apply, so each is one
// undo step, or refused), with undo and redo among them, drawn from a seed so
// that a run can be replayed. Values are now and then out of range and names
// now and then odd, so that refusals are exercised too.
#pragma once

#include "ui/document/mechanism_document.h"

#include <functional>
#include <random>
#include <string>

namespace clevis::test {

class RandomEdits {
public:
    RandomEdits(ui::MechanismDocument& doc, unsigned seed) : doc_(doc), rng_(seed) {}

    // One edit, undo or redo; returns what it did, and why the document
    // refused it where it did. A refused edit must leave the document as it
    // was (checked here).
    std::string step();

private:
    int pick(int n) { return std::uniform_int_distribution<int>(0, n - 1)(rng_); }
    double number();  // now and then out of range
    Vec2 point();     // mostly on a grid, so that pins meet
    double angle() { return 15.0 * pick(24); }
    std::string someName();

    template <class List>
    std::string nameIn(const List& list)
    {
        return list.empty() ? std::string() : list[pick(int(list.size()))].name;
    }
    std::string bodyOrGround(const Mechanism& m);

    std::string apply(const std::string& what, const std::function<void(Mechanism&)>& edit);
    std::string addBody();
    std::string addDriver();
    std::string addLoad();
    std::string moveJoint();
    std::string removePart();
    std::string rename();
    std::string setValue();
    std::string setJointValue();
    std::string setDriverValue();
    std::string setLoadValue();

    ui::MechanismDocument& doc_;
    std::mt19937 rng_;
};

}  // namespace clevis::test
