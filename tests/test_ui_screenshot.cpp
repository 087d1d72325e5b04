// Runs `clevis --screenshot OUT.png SAMPLE` and checks the picture: the size
// the screenshot promises, the canvas's paper showing, and the mechanism drawn
// on it (the blue outline of its moving bodies).
//   usage: test_ui_screenshot PATH/TO/clevis SAMPLE.json
#include "render/palette.h"
#include "ui/shell/screenshot.h"

#include <QCoreApplication>
#include <QImage>
#include <QProcess>
#include <QTemporaryDir>
#include <QTextStream>

namespace {

bool near(QRgb pixel, const QColor& c)
{
    return std::abs(qRed(pixel) - c.red()) <= 6 && std::abs(qGreen(pixel) - c.green()) <= 6 &&
           std::abs(qBlue(pixel) - c.blue()) <= 6;
}

}  // namespace

int main(int argc, char** argv)
{
    QCoreApplication app(argc, argv);
    QTextStream out(stderr);
    if (argc != 3) {
        out << "usage: test_ui_screenshot CLEVIS SAMPLE.json\n";
        return 2;
    }
    QTemporaryDir dir;
    const QString png = dir.filePath("shot.png");
    QProcess clevis;
    clevis.setProcessChannelMode(QProcess::ForwardedChannels);
    clevis.start(QString::fromLocal8Bit(argv[1]), {"--screenshot", png, QString::fromLocal8Bit(argv[2])});
    if (!clevis.waitForFinished(100000) || clevis.exitStatus() != QProcess::NormalExit || clevis.exitCode() != 0) {
        out << "clevis --screenshot failed (exit code " << clevis.exitCode() << ")\n";
        return 1;
    }
    const QImage image(png);
    if (image.isNull()) {
        out << "no readable PNG at " << png << "\n";
        return 1;
    }
    const QSize expected = clevis::ui::kScreenshotSize;
    if (image.size() != expected) {
        out << "size " << image.width() << "×" << image.height() << ", expected " << expected.width() << "×"
            << expected.height() << "\n";
        return 1;
    }
    long paper = 0, outline = 0;
    for (int y = 0; y < image.height(); ++y)
        for (int x = 0; x < image.width(); ++x) {
            const QRgb p = image.pixel(x, y);
            paper += near(p, clevis::ui::palette::paper());
            outline += near(p, clevis::ui::palette::link());
        }
    const long total = long(image.width()) * image.height();
    // The canvas takes well over a fifth of the window; a drawn mechanism
    // leaves at least a few hundred pixels of body outline.
    if (paper < total / 5) {
        out << "the canvas's paper covers only " << paper << " of " << total << " pixels\n";
        return 1;
    }
    if (outline < 300) {
        out << "only " << outline << " pixels of body outline: the mechanism is not drawn\n";
        return 1;
    }
    out << "ok: " << image.width() << "×" << image.height() << ", " << outline << " outline pixels\n";
    return 0;
}
