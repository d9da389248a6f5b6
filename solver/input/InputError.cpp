#include "solver/input/InputError.hpp"

#include <fmt/format.h>

namespace coldtip::input {

namespace {

std::string formatMessage(const SourceMark& mark, std::string_view problem,
                          std::string_view expected, std::string_view sourceText)
{
    std::string message = mark.file;
    if (mark.line > 0)
        message += fmt::format(":{}:{}", mark.line, mark.column);
    message += ": error: ";
    if (!mark.path.empty())
        message += fmt::format("{}: ", mark.path);
    message += problem;
    if (!expected.empty())
        message += fmt::format("; expected {}", expected);
    const std::string excerpt = sourceExcerpt(sourceText, mark.line, mark.column);
    if (!excerpt.empty())
        message += "\n" + excerpt;
    return message;
}

} // namespace

InputError::InputError(SourceMark mark, std::string problem, std::string expected,
                       std::string_view sourceText)
    : std::runtime_error(formatMessage(mark, problem, expected, sourceText)),
      m_mark(std::move(mark)), m_problem(std::move(problem)),
      m_expected(std::move(expected))
{
}

std::string sourceExcerpt(std::string_view text, int line, int column)
{
    if (line < 1)
        return {};
    std::size_t begin = 0;
    for (int i = 1; i < line; ++i) {
        begin = text.find('\n', begin);
        if (begin == std::string_view::npos)
            return {};
        ++begin;
    }
    if (begin >= text.size())
        return {};
    std::string_view source = text.substr(begin, text.find('\n', begin) - begin);
    if (!source.empty() && source.back() == '\r')
        source.remove_suffix(1);

    // The caret keeps the line's tabs and counts one space per UTF-8 character, not per
    // byte (yaml-cpp's columns count bytes), so that it sits under the column on screen.
    std::string caret;
    const std::size_t before =
        std::min<std::size_t>(std::max(column - 1, 0), source.size());
    for (std::size_t i = 0; i < before; ++i) {
        const unsigned char c = static_cast<unsigned char>(source[i]);
        if (c == '\t')
            caret += '\t';
        else if ((c & 0xC0) != 0x80)
            caret += ' ';
    }
    const std::string gutter = fmt::format(" {:>4} | ", line);
    return fmt::format("{}{}\n{:>{}}{}^", gutter, source, "| ", gutter.size(), caret);
}

} // namespace coldtip::input
