// The deflate level of the PDFs this program writes. Qt's PDF writer
// compresses every page's content with zlib at its default level (6), on the
// thread that paints, and offers no setting; the review report of a large
// machine spends a third of its time there. Level 1 compresses the same
// content about three times as fast for a file about a fifth larger (README,
// "Speed and limits"). This definition takes the place of zlib's own for the
// whole process (the executable's symbols come first when a library's are
// bound), keeps any level a caller names, and turns only "the default" into 1;
// the output is ordinary zlib data that every reader inflates alike.
#include <zlib.h>

extern "C" int deflateInit_(z_streamp stream, int level, const char* version, int streamSize)
{
    constexpr int kMemLevel = 8;  // zlib's own default, as its deflateInit_ uses
    return deflateInit2_(stream, level == Z_DEFAULT_COMPRESSION ? Z_BEST_SPEED : level, Z_DEFLATED, MAX_WBITS,
                         kMemLevel, Z_DEFAULT_STRATEGY, version, streamSize);
}
