// Writes the generated fan of four-bars round one crank (chain_generator.h)
// as a mechanism file on stdout, for timing the programs on a large machine
// by hand: `clevis_fan_file 100 > fan100.json` gives the 201-body fan the
// README's report timing uses.
#include "core/file/mechanism_file.h"
#include "tests/chain_generator.h"

#include <cstdlib>
#include <iostream>
#include <stdexcept>

int main(int argc, char** argv)
{
    if (argc != 2) {
        std::cerr << "usage: clevis_fan_file LOOPS > FILE.json\n";
        return 2;
    }
    try {
        std::cout << clevis::saveMechanismText(clevis::test::fourBarFan(std::atoi(argv[1])));
    } catch (const std::exception& e) {
        std::cerr << "clevis_fan_file: " << e.what() << '\n';
        return 1;
    }
    return 0;
}
