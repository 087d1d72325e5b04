// A bundled sample's path and its mechanism, for the tests that start from one.
#pragma once

#include "core/file/mechanism_file.h"

#include <string>

#ifndef CLEVIS_SAMPLES_DIR
#error "CLEVIS_SAMPLES_DIR must name the samples folder"
#endif

namespace clevis::test {

inline std::string samplePath(const std::string& name)
{
    return std::string(CLEVIS_SAMPLES_DIR) + "/" + name + ".json";
}

inline Mechanism loadSample(const std::string& name) { return loadMechanismFile(samplePath(name)).mechanism; }

}  // namespace clevis::test
