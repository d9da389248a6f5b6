#include <iostream>

#include "solver/cli/Commands.hpp"
#include "solver/input/KeyTable.hpp"

namespace coldtip::cli {

void addKeysCommand(CLI::App& app, Action& action, const CommandContext&)
{
    auto* keys = app.add_subcommand("keys", "print the case-file key reference (Markdown)");
    keys->callback([&action] {
        action = [] {
            std::cout << input::keyReferenceMarkdown();
            return kExitSuccess;
        };
    });
}

} // namespace coldtip::cli
