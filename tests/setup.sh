# Sourced by tests/run and app/run: installs the Debian packages Tauline
# needs when any is missing, then configures and builds into build/.
#   TAULINE_BUILD_DIR   build directory (default: <repository>/build)
#   TAULINE_CMAKE_ARGS  extra configure arguments, e.g. -DTAULINE_WITH_UI=OFF

TAULINE_ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
TAULINE_BUILD_DIR="${TAULINE_BUILD_DIR:-$TAULINE_ROOT/build}"

TAULINE_PACKAGES=(
    cmake g++ qt6-base-dev qt6-charts-dev qt6-svg-dev libqt6opengl6-dev
    libeigen3-dev catch2 nlohmann-json3-dev fonts-dejavu-core
    python3-sympy python3-scipy python3-numpy xvfb xauth imagemagick
)

tauline_install_packages() {
    local missing=() package
    for package in "${TAULINE_PACKAGES[@]}"; do
        if ! dpkg-query -W -f='${Status}' "$package" 2>/dev/null | grep -q 'install ok installed'; then
            missing+=("$package")
        fi
    done
    if [ "${#missing[@]}" -eq 0 ]; then
        return 0
    fi
    echo "Installing: ${missing[*]}"
    local sudo=()
    if [ "$(id -u)" -ne 0 ]; then
        sudo=(sudo)
    fi
    "${sudo[@]}" apt-get update
    "${sudo[@]}" env DEBIAN_FRONTEND=noninteractive apt-get install -y --no-install-recommends "${missing[@]}"
}

tauline_build() {
    local extra=()
    if [ -n "${TAULINE_CMAKE_ARGS:-}" ]; then
        read -r -a extra <<<"$TAULINE_CMAKE_ARGS"
    fi
    cmake -S "$TAULINE_ROOT" -B "$TAULINE_BUILD_DIR" -DCMAKE_BUILD_TYPE=Release "${extra[@]}"
    cmake --build "$TAULINE_BUILD_DIR" -j"$(nproc)"
}
