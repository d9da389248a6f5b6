#include "solver/cli/Commands.hpp"

int main(int argc, char** argv) { return coldtip::cli::main(argc, argv); }
