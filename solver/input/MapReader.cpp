#include "solver/input/MapReader.hpp"

#include "solver/input/ClosestName.hpp"
#include "solver/input/InputError.hpp"

#include <algorithm>
#include <charconv>
#include <climits>
#include <cmath>
#include <fmt/format.h>
#include <stdexcept>

namespace coldtip::input {

namespace {

std::string describeNode(const YAML::Node& node)
{
    if (!node.IsDefined() || node.IsNull())
        return "no value";
    if (node.IsMap())
        return "a map";
    if (node.IsSequence())
        return "a list";
    // A whole file can be one scalar (a file that is not YAML): keep the message short.
    const std::string& text = node.Scalar();
    const std::size_t cut = std::min(text.find('\n'), std::size_t{40});
    return fmt::format("'{}{}'", text.substr(0, cut), cut < text.size() ? "..." : "");
}

std::string joinedKeys(const std::vector<Table>& tables)
{
    return joinWords(declaredKeys(tables));
}

// The value as the user wrote it, with its SI equivalent when the unit was another.
std::string shown(const std::string& text, const Quantity& q, Dimension dimension)
{
    const std::string_view si = describe(dimension).siUnit;
    if (q.unit.empty())
        return si.empty() ? text : fmt::format("{} {}", text, si);
    if (q.unit == si)
        return text;
    return fmt::format("{} (= {:g} {})", text, q.value, si);
}

bool isWhole(std::string_view text, const char* end)
{
    return end == text.data() + text.size();
}

// "is out of range (too large)": which side of `range` the value `x` fell on.
std::string outOfRange(const Range& range, double x)
{
    return x > range.lo ? "is out of range (too large)" : "is out of range (too small)";
}

// What one entry of a list of quantities must be.
std::string entryExpectation(const KeyEntry& list)
{
    KeyEntry one = list;
    one.kind = ValueKind::Quantity;
    return fmt::format("{} as each entry of {}", expectation(one), list.key);
}

} // namespace

SourceMark ReadContext::at(const YAML::Mark& mark, std::string path) const
{
    if (mark.is_null())
        return {file, 0, 0, std::move(path)};
    return {file, mark.line + 1, mark.column + 1, std::move(path)};
}

void ReadContext::fail(const SourceMark& where, std::string problem,
                       std::string expected) const
{
    throw InputError(where, std::move(problem), std::move(expected), text);
}

std::string scalarText(const YAML::Node& node, const SourceMark& where,
                       const ReadContext& context, const std::string& expected)
{
    if (!node.IsScalar())
        context.fail(where, "got " + describeNode(node), expected);
    return node.Scalar();
}

MapReader::MapReader(const YAML::Node& node, SourceMark mark, const ReadContext& context,
                     std::vector<Table> tables, UnknownKeys unknown)
    : m_context(context), m_mark(std::move(mark)), m_tables(std::move(tables))
{
    if (!node.IsDefined() || node.IsNull())
        return;
    if (!node.IsMap())
        m_context.fail(m_mark, "got " + describeNode(node),
                       "a map with keys " + joinedKeys(m_tables));
    // yaml-cpp's iterators yield temporaries: copy the nodes (they are handles).
    for (const auto& pair : node) {
        const YAML::Node keyNode = pair.first;
        SourceMark keyMark = m_context.at(keyNode.Mark(), m_mark.path);
        if (!keyNode.IsScalar())
            m_context.fail(keyMark, "got " + describeNode(keyNode) + " as a key",
                           "a plain name as a key, one of: " + joinedKeys(m_tables));
        const std::string key = keyNode.Scalar();
        keyMark.path = childPath(key);
        if (const Item* first = item(key))
            m_context.fail(keyMark,
                           fmt::format("duplicate key '{}' (first at line {})", key,
                                       first->mark.line),
                           "each key once in a map");
        if (unknown == UnknownKeys::Reject) {
            const std::vector<std::string> declared = declaredKeys(m_tables);
            if (std::find(declared.begin(), declared.end(), key) == declared.end())
                m_context.fail(
                    keyMark,
                    fmt::format("unknown key '{}'{}", key, didYouMean(key, declared)),
                    "one of: " + joinedKeys(m_tables));
        }
        const YAML::Node value = pair.second;
        SourceMark valueMark =
            value.IsNull() ? keyMark : m_context.at(value.Mark(), keyMark.path);
        if (m_context.marks)
            (*m_context.marks)[valueMark.path] = valueMark;
        m_items.push_back({key, value, std::move(valueMark)});
    }
}

const MapReader::Item* MapReader::item(std::string_view key) const
{
    for (const Item& i : m_items)
        if (i.key == key)
            return &i;
    return nullptr;
}

std::string MapReader::childPath(std::string_view key) const
{
    return m_mark.path.empty() ? std::string(key)
                               : fmt::format("{}.{}", m_mark.path, key);
}

bool MapReader::has(std::string_view key) const
{
    return item(key) != nullptr;
}

SourceMark MapReader::markOf(std::string_view key) const
{
    if (const Item* i = item(key))
        return i->mark;
    return {m_mark.file, m_mark.line, m_mark.column, childPath(key)};
}

std::string MapReader::written(std::string_view key) const
{
    const Item* i = item(key);
    return i && i->value.IsScalar() ? i->value.Scalar() : std::string();
}

const KeyEntry& MapReader::entry(std::string_view key) const
{
    for (Table t : m_tables)
        if (const KeyEntry* e = keyTable(t).find(key))
            return *e;
    throw std::logic_error(
        fmt::format("key '{}' is not declared for {}", key, m_mark.path));
}

std::optional<MapReader::Scalar> MapReader::scalar(const KeyEntry& e) const
{
    const Item* i = item(e.key);
    if (!i) {
        if (!e.defaultValue.empty())
            return Scalar{e.defaultValue, markOf(e.key)};
        if (e.required)
            missing(e, "");
        return std::nullopt;
    }
    return Scalar{scalarText(i->value, i->mark, m_context, expectation(e)), i->mark};
}

void MapReader::missing(const KeyEntry& e, std::string_view why) const
{
    m_context.fail(markOf(e.key), fmt::format("missing required key '{}'{}", e.key, why),
                   expectation(e));
}

void MapReader::require(std::string_view key, std::string_view why) const
{
    if (!has(key))
        missing(entry(key), why);
}

void MapReader::fail(std::string_view key, std::string problem,
                     std::string expected) const
{
    m_context.fail(markOf(key), std::move(problem), std::move(expected));
}

void MapReader::failHere(std::string problem, std::string expected) const
{
    m_context.fail(m_mark, std::move(problem), std::move(expected));
}

double MapReader::convert(const KeyEntry& e, const Scalar& s) const
{
    Quantity q;
    try {
        q = UnitConverter::instance().parse(s.text, e.dimension);
    } catch (const UnitError& error) {
        m_context.fail(s.mark, error.what(), expectedQuantity(e.dimension));
    }
    if (q.unit.empty() && !e.unitNote.empty()) {
        const DimensionInfo& d = describe(e.dimension);
        m_context.fail(s.mark,
                       fmt::format("'{}' has no unit: a bare number is read in SI ({}), "
                                   "but {}",
                                   s.text, d.siUnit, e.unitNote),
                       fmt::format("{} {} with its unit, e.g. \"{}\"", d.article, d.name,
                                   d.example));
    }
    if (!e.range.contains(q.value))
        m_context.fail(s.mark,
                       fmt::format("{} {}", shown(s.text, q, e.dimension),
                                   outOfRange(e.range, q.value)),
                       expectation(e));
    return q.value;
}

std::optional<double> MapReader::optionalQuantity(std::string_view key) const
{
    const KeyEntry& e = entry(key);
    const auto s = scalar(e);
    if (!s)
        return std::nullopt;
    return convert(e, *s);
}

std::vector<double> MapReader::quantities(std::string_view key) const
{
    const KeyEntry& e = entry(key);
    const Item* i = item(key);
    if (i && i->value.IsScalar())
        return {convert(e, {i->value.Scalar(), i->mark})};
    std::vector<double> values;
    for (const Element& element : list(key))
        values.push_back(convert(
            e, {scalarText(element.node, element.mark, m_context, entryExpectation(e)),
                element.mark}));
    return values;
}

std::optional<int> MapReader::optionalInteger(std::string_view key) const
{
    const KeyEntry& e = entry(key);
    const auto s = scalar(e);
    if (!s)
        return std::nullopt;
    // A leading '+' is valid YAML but not accepted by from_chars.
    const std::string_view digits = !s->text.empty() && s->text.front() == '+'
                                        ? std::string_view(s->text).substr(1)
                                        : std::string_view(s->text);
    long long value = 0;
    const auto [end, ec] =
        std::from_chars(digits.data(), digits.data() + digits.size(), value);
    if (ec == std::errc::result_out_of_range)
        m_context.fail(s->mark,
                       fmt::format("{} {}", s->text,
                                   outOfRange(e.range, digits.front() == '-' ? -1e300 : 1e300)),
                       expectation(e));
    if (ec != std::errc() || !isWhole(digits, end)) {
        // Whole numbers written as reals ("2e4", "20.0") are accepted; 2.5 is not.
        double real = 0.0;
        const auto [realEnd, realEc] =
            std::from_chars(digits.data(), digits.data() + digits.size(), real);
        const bool isNumber = realEc == std::errc() && isWhole(digits, realEnd);
        if (!isNumber)
            m_context.fail(s->mark, fmt::format("'{}' is not an integer", s->text),
                           expectation(e));
        if (real != std::trunc(real))
            m_context.fail(s->mark, fmt::format("{} is not an integer", s->text),
                           expectation(e));
        if (std::fabs(real) > 9e15)
            m_context.fail(s->mark, fmt::format("{} {}", s->text, outOfRange(e.range, real)),
                           expectation(e));
        value = static_cast<long long>(real);
    }
    if (!e.range.contains(static_cast<double>(value)) || value < INT_MIN ||
        value > INT_MAX)
        m_context.fail(s->mark,
                       fmt::format("{} {}", s->text,
                                   outOfRange(e.range, static_cast<double>(value))),
                       expectation(e));
    return static_cast<int>(value);
}

std::optional<std::string> MapReader::optionalText(std::string_view key) const
{
    const auto s = scalar(entry(key));
    return s ? std::optional<std::string>(s->text) : std::nullopt;
}

std::optional<std::string> MapReader::optionalChoice(std::string_view key) const
{
    const KeyEntry& e = entry(key);
    const auto s = scalar(e);
    if (!s)
        return std::nullopt;
    if (std::find(e.choices.begin(), e.choices.end(), s->text) == e.choices.end())
        m_context.fail(s->mark,
                       fmt::format("unknown {} '{}'{}", e.key, s->text,
                                   didYouMean(s->text, e.choices)),
                       expectation(e));
    return s->text;
}

namespace {

// The value of a key the table requires or gives a default for.
template <typename T> T present(const std::optional<T>& value, std::string_view key)
{
    if (!value)
        throw std::logic_error(
            fmt::format("key '{}' has neither a value nor a default", key));
    return *value;
}

} // namespace

double MapReader::quantity(std::string_view key) const
{
    return present(optionalQuantity(key), key);
}
int MapReader::integer(std::string_view key) const
{
    return present(optionalInteger(key), key);
}
std::string MapReader::text(std::string_view key) const
{
    return present(optionalText(key), key);
}
std::string MapReader::choice(std::string_view key) const
{
    return present(optionalChoice(key), key);
}

MapReader MapReader::map(std::string_view key) const
{
    return map(key, entry(key).tables);
}

MapReader MapReader::map(std::string_view key, std::vector<Table> tables,
                         UnknownKeys unknown) const
{
    const KeyEntry& e = entry(key);
    const Item* i = item(key);
    if (!i && e.required)
        missing(e, "");
    if (!i)
        return MapReader(YAML::Node(), markOf(key), m_context, std::move(tables),
                         unknown);
    return MapReader(i->value, i->mark, m_context, std::move(tables), unknown);
}

std::vector<Element> MapReader::list(std::string_view key) const
{
    const KeyEntry& e = entry(key);
    const Item* i = item(key);
    if (!i && e.required)
        missing(e, "");
    std::vector<Element> elements;
    if (!i || i->value.IsNull())
        return elements;
    if (!i->value.IsSequence())
        m_context.fail(i->mark, "got " + describeNode(i->value), expectation(e));
    for (const YAML::Node& node : i->value) {
        const std::string path = fmt::format("{}[{}]", i->mark.path, elements.size());
        SourceMark mark =
            node.IsNull() ? SourceMark{i->mark.file, i->mark.line, i->mark.column, path}
                          : m_context.at(node.Mark(), path);
        if (m_context.marks)
            (*m_context.marks)[path] = mark;
        elements.push_back({node, std::move(mark)});
    }
    return elements;
}

} // namespace coldtip::input
