// The one Catch2 runner for every test program: Debian's prebuilt
// Catch2WithMain lacks benchmarking, and the Qt tests need a QApplication
// even when ctest's discovery runs the binary without its environment.
#define CATCH_CONFIG_RUNNER
#include <catch2/catch.hpp>

#include <cstdlib>

#ifdef TAULINE_WITH_UI
#include <QApplication>
#include <QSettings>
#include <QTemporaryDir>
#endif

int main(int argc, char* argv[])
{
#ifdef TAULINE_WITH_UI
    if (!std::getenv("QT_QPA_PLATFORM"))
        setenv("QT_QPA_PLATFORM", "offscreen", 1);
    QApplication app(argc, argv);
    // ctest runs test processes side by side: each gets settings of its own,
    // so one test's saved window layout never lands in another's.
    QTemporaryDir settingsDir;
    QSettings::setPath(QSettings::NativeFormat, QSettings::UserScope, settingsDir.path());
    QSettings::setPath(QSettings::IniFormat, QSettings::UserScope, settingsDir.path());
#endif
    return Catch::Session().run(argc, argv);
}
