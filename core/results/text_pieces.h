// Text handed on in pieces as it is made (results files of tens of
// megabytes), instead of being held whole: each call gets the next piece.
#pragma once

#include <cstddef>
#include <functional>
#include <string_view>

namespace clevis {

using TextPieces = std::function<void(std::string_view)>;

// About the size of a piece: large enough that handing one on (a write to a
// file) is rare, small beside a results file (a 200-body cycle's JSON is 40 MB).
inline constexpr std::size_t kTextPiece = std::size_t(1) << 20;

}  // namespace clevis
