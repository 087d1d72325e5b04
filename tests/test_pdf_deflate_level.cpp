// The programs that write PDFs deflate at zlib's fastest level when a caller
// (Qt's PDF writer) asks for the default, and at any level named.
#include <zlib.h>

#include <gtest/gtest.h>

#include <string>

namespace {

// Page-like text: drawing operators with numbers, as a PDF page's content is.
std::string pageText()
{
    std::string s;
    for (int i = 0; i < 20000; ++i)
        s += std::to_string(100.0 + 37.0 * (i % 97) / 7.0) + " " + std::to_string(200.0 + (i * 13 % 101) / 3.0) +
             (i % 5 ? " l\n" : " m\n");
    return s;
}

std::string deflated(const std::string& in, int level, bool throughDefaultInit)
{
    z_stream z{};
    const int init = throughDefaultInit ? deflateInit(&z, level)
                                        : deflateInit2(&z, level, Z_DEFLATED, MAX_WBITS, 8, Z_DEFAULT_STRATEGY);
    EXPECT_EQ(init, Z_OK);
    std::string out(deflateBound(&z, uLong(in.size())), '\0');
    z.next_in = reinterpret_cast<Bytef*>(const_cast<char*>(in.data()));
    z.avail_in = uInt(in.size());
    z.next_out = reinterpret_cast<Bytef*>(out.data());
    z.avail_out = uInt(out.size());
    EXPECT_EQ(deflate(&z, Z_FINISH), Z_STREAM_END);
    out.resize(z.total_out);
    deflateEnd(&z);
    return out;
}

}  // namespace

TEST(PdfDeflateLevel, TheDefaultIsTheFastestLevelAndANamedLevelIsKept)
{
    const std::string text = pageText();
    const std::string fastest = deflated(text, Z_BEST_SPEED, false);
    const std::string zlibDefault = deflated(text, 6, false);  // zlib's own default level
    ASSERT_NE(fastest, zlibDefault) << "the two levels must differ on this text for the test to tell them apart";
    EXPECT_EQ(deflated(text, Z_DEFAULT_COMPRESSION, true), fastest);
    EXPECT_EQ(deflated(text, 6, true), zlibDefault);
    EXPECT_EQ(deflated(text, 9, true), deflated(text, 9, false));
}
