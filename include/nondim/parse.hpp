#pragma once
/// \file parse.hpp
/// \brief Unit expressions at run time: `parse_unit`, `parse_quantity`, `convert`, and
/// printing back. Standard library only.
///
/// Grammar (SI Brochure 9th ed., 5.4.6; ISO 80000-1, 7.1):
///
///     expression  := group
///     group       := factor { product factor } [ "/" factor ]   -- one solidus per group
///     product     := "*" | "·" (U+00B7) | "⋅" (U+22C5) | spaces
///     factor      := ( symbol | "1" | "(" group ")" ) [ power ]
///     power       := ("^" | "**") exponent | superscripts     -- m², s⁻¹
///     exponent    := signed integer | signed exact decimal (0.5 is 1/2, 0.333 is 333/1000)
///                  | "(" signed number [ "/" signed number ] ")"
///
/// - The right side of the solidus is one factor or a bracketed group: `kg/m/s` and
///   `J/kg*K` are errors whose message gives `kg/(m*s)` and `J/(kg*K)` (everything after
///   the solidus bracketed). Each bracketed group has its own solidus: `(m/s)^2`, `kg/(m/s)`.
/// - The number 1 may stand as a factor (`1/s`); any other number is refused with a hint
///   (values belong to `parse_quantity`, scales to prefixes).
/// - Spaces are ASCII white space, U+00A0, U+2000..U+200A and U+202F.
/// - A power applies to the whole prefixed symbol (`km^2` is (km)^2); a power cannot
///   follow a power (`m^2^3`).
///
/// Symbol resolution (the unit table, `units/table.hpp`):
///  1. an alias is replaced by its symbol (`l` -> `L`, `°C` and `℃` -> `degC`, `Ohm` -> `Ω`,
///     `kt` -> `knot`, `BTU` -> `Btu`);
///  2. a whole symbol wins over prefix + symbol (`min`, `Pa`, `cd`, `h`, `ha`, `mi`, `ft`, `P`,
///     `nmi`, `Da`, `pdl`);
///  3. otherwise the longest SI prefix whose remainder is a prefixable unit (`da` before
///     `d`; `u`, `µ` U+00B5 and `μ` U+03BC are micro). Prefixes apply to SI units and the
///     metric units marked prefixable (L, t, bar, eV, cal, P, St, Wh ...), never to
///     customary units; the kilogram takes its prefixes on `g`.
///
/// Temperatures: `degC`, `°C`, `℃`, `degF`, `°F`, `℉` are absolute (affine: SI = factor*x
/// + offset) only when the whole trimmed text is that one symbol; inside any compound unit
/// (`degC/s`, `(degC)`, `degC^1`) they are intervals. `K` and `degR` are never affine.
///
/// Limits: at most `max_unit_text_bytes` (4096) bytes of text and `max_unit_nesting` (32)
/// levels of parentheses; exponents are exact rationals with 64-bit numerator and
/// denominator (|p|, q <= 2^63 - 1); the factor to SI, and every partial product of it
/// while reading, must be a normal finite double (powers of ten within 10^±308).
/// Time is linear in the length of the text; recursion only for parentheses.
///
/// Errors: `unit_error` (std::invalid_argument) with `column()` (1-based, in code points of
/// the whole text) and `kind()`; `dimension_error` when a dimension is not the one required.

#include "solver/parse/errors.hpp"
#include "solver/parse/quantity_text.hpp"
#include "solver/parse/temperature_text.hpp"
#include "solver/parse/unit_format.hpp"
#include "solver/parse/unit_parser.hpp"
