// The edits the canvas and panels make, as plain functions on a Mechanism.
// They run inside MechanismDocument::apply(), so each is one undo step.
//
// A pin not yet joining two bodies is a joint with an empty body name: the
// document is the only place the sketch lives, so an unfinished pin is saved
// as such and the status line says what it still lacks.
#pragma once

#include "core/model/mechanism.h"
#include "ui/document/mechanism_document.h"

#include <string>
#include <vector>

namespace clevis::ui::edits {

std::string addGroundPin(Mechanism& m, const Vec2& at);
std::string addPin(Mechanism& m, const Vec2& at);

// A bar (two pins) or a plate (three or more) through the named joints; the
// new body is connected at each. Returns the body's name.
std::string addBody(Mechanism& m, const std::vector<std::string>& joints);

// A block guided along `axisDeg` by `guide` (ground or a body), with a pin on
// the block at the same point for a link to attach to. Returns the slider joint.
std::string addSlider(Mechanism& m, const std::string& guide, const Vec2& at, double axisDeg);
// A slot in `slotBody`; the pin is attached when a link is drawn to it.
std::string addPinInSlot(Mechanism& m, const std::string& slotBody, const Vec2& at, double axisDeg);

std::string addRotaryMotor(Mechanism& m, const std::string& pinJoint);     // 60 rpm
std::string addSliderDrive(Mechanism& m, const std::string& sliderJoint);  // strokes 50 mm and back
std::string addCylinder(Mechanism& m, const BodyPointRef& a, const BodyPointRef& b);

void addForce(Mechanism& m, const BodyPointRef& at, const Vec2& force);
void addTorque(Mechanism& m, const std::string& body, double torque);
void addSpring(Mechanism& m, const BodyPointRef& a, const BodyPointRef& b);  // relaxed as drawn
void addDamper(Mechanism& m, const BodyPointRef& a, const BodyPointRef& b);
void addPointMass(Mechanism& m, const std::string& body, const Vec2& at, double mass);

// Moves the joint and everything fixed at the same point (coincident joints,
// load and driver attachments) to `to`.
void moveJoint(Mechanism& m, int joint, const Vec2& to);

// Removes the part and what cannot stand without it (the drivers and loads on
// it; a body left without pins). A load whose profile follows a removed driver
// keeps its nominal value and loses the profile: the names of those loads are
// returned so the user can be told.
std::vector<std::string> remove(Mechanism& m, const Selection& s);

// Renames and updates every reference to the old name.
void renameBody(Mechanism& m, const std::string& from, const std::string& to);
void renameJoint(Mechanism& m, const std::string& from, const std::string& to);
void renameDriver(Mechanism& m, const std::string& from, const std::string& to);

}  // namespace clevis::ui::edits
