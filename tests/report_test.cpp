// Tests of nondim/report: the text, Markdown, LaTeX and JSON views of an analysis.
// Groups are those of textbook problems (source beside each); JSON is read back with
// nlohmann-json (RFC 8259 parser) to check the escaping and the numbers.
#include <nondim/report.hpp>

#include <doctest/doctest.h>
#include <nlohmann/json.hpp>

#include <cmath>
#include <limits>
#include <string>
#include "text_support.hpp"

using namespace nondim;

namespace {
// Drag on a sphere: F = f(rho, U, D, mu) gives F/(rho U^2 D^2) and mu/(rho U D)
// (White, Fluid Mechanics, 7th ed., section 5.3).
analysis drag() {
  problem p;
  p.add("F", "N").add("rho", "kg/m^3").add("U", "m/s").add("D", "m").add("mu", "Pa*s");
  return analyze(p);
}
using test_support::contains;
}  // namespace

TEST_SUITE("report") {
  TEST_CASE("variable names are written in LaTeX with Greek letters and subscripts") {
    // Greek macros of plain LaTeX (Lamport, LaTeX: A Document Preparation System, table 3.3): common practice
    CHECK(latex_name("rho") == "\\rho");
    CHECK(latex_name("mu") == "\\mu");
    CHECK(latex_name("nu") == "\\nu");
    CHECK(latex_name("sigma") == "\\sigma");
    CHECK(latex_name("alpha") == "\\alpha");
    CHECK(latex_name("beta") == "\\beta");
    CHECK(latex_name("Delta") == "\\Delta");
    CHECK(latex_name("eps") == "\\varepsilon");
    CHECK(latex_name("mu_w") == "\\mu_{w}");
    CHECK(latex_name("D_h") == "D_{h}");
    CHECK(latex_name("T_inf") == "T_{\\mathrm{inf}}");
    CHECK(latex_name("L1") == "L_{1}");
    CHECK(latex_name("dp") == "\\Delta p");         // a pressure difference, common practice
    CHECK(latex_name("rhoU") == "\\mathrm{rhoU}");  // not a Greek name followed by '_' or a digit
    CHECK(latex_name("a#b") == "\\mathrm{a\\#b}");  // special characters escaped
    CHECK(latex_name("x_{") == "x_{\\mathrm{\\{}}");
  }

  TEST_CASE("symbols run together in one name are separated and conventional spellings typeset") {
    // common practice, no source: the heat rate of an exchanger UA dT_max (Incropera et al.,
    // ch. 11, eps-NTU method, from memory) given as one variable; a buoyancy product
    // drho d^2 g given as one variable (Clift, Grace & Weber's Eotvos number, from memory)
    CHECK(latex_name("UAdT_max") == "\\mathrm{UA}\\,\\Delta T_{\\max}");
    CHECK(latex_name("drhod\u00b2g") == "\\Delta\\rho\\,d^{2}\\,g");
    CHECK(latex_name("drho") == "\\Delta\\rho");
    CHECK(latex_name("mdot") == "\\dot{m}");
    CHECK(latex_name("m_dot") == "\\dot{m}");
    CHECK(latex_name("gbdT") == "g\\,b\\,\\Delta T");
    CHECK(latex_name("T_min") == "T_{\\min}");
    // words with no conventional piece stay one upright word; an inner diameter di stays
    CHECK(latex_name("time") == "\\mathrm{time}");
    CHECK(latex_name("di") == "\\mathrm{di}");
    CHECK(latex_name("cp") == "\\mathrm{cp}");
    // raised as a whole: (Delta p)^2, not Delta (p^2)
    const analysis a = analyze(problem{}.add("dp", dims::pressure).add("rho", dims::density).add("U", dims::velocity));
    CHECK(latex(a.groups[0]) == "\\frac{\\Delta p}{\\rho U^{2}}");
    const analysis b = analyze(problem{}.add("rho", dims::density).add("dp", dims::pressure).add("U", dims::velocity));
    CHECK(latex(b.groups[0]) == "\\frac{\\rho U^{2}}{\\Delta p}");
    const analysis c =
        analyze(problem{}.add("q", dims::power * dims::power).add("UAdT", dims::power).add("F", dims::force));
    REQUIRE(!c.groups.empty());
    CHECK(latex(c.groups[0]).find("(\\mathrm{UA}\\,\\Delta T)^{2}") != std::string::npos);
  }

  TEST_CASE("the text view describes an unnamed ratio of one dimension neutrally") {
    // White, Fluid Mechanics, ch. 10 (from memory): a sharp-crested weir, Q/(b sqrt(g) H^1.5)
    // = f(P/H, b/H); P/H is no Knudsen number (DESIGN.md, "Rules for the groups")
    problem p;
    p.add("Q", "m^3/s").add("b", "m").add("H", "m").add("P", "m").add("g", "m/s^2");
    options o;
    o.repeating = {"H", "g"};
    const std::string t = text_report(analyze(p, o));
    CHECK(t.find("P\u00b7H\u207b\u00b9 (ratio of two lengths)") != std::string::npos);
    CHECK(t.find("Kn") == std::string::npos);
    // two densities: a ratio of two densities
    problem q;
    q.add("rho_p", "kg/m^3").add("rho", "kg/m^3");
    CHECK(text_report(analyze(q)).find("(ratio of two densities)") != std::string::npos);
  }

  TEST_CASE("a group that mixes rad/s with rpm notes the hidden factor 2 pi") {
    // ISO 80000-3: omega = 2 pi n; rpm is a rotational frequency (1/60 s^-1), rad/s an angular
    // velocity; both are s^-1 to the dimensions
    problem p;
    p.add("n", "rpm").add("omega", "rad/s");
    const std::string t = text_report(analyze(p));
    CHECK(t.find("mixes") != std::string::npos);
    CHECK(t.find("2\u03c0") != std::string::npos);
    // the same family on both sides: no note
    problem q;
    q.add("n", "rpm").add("f", "Hz");
    CHECK(text_report(analyze(q)).find("mixes") == std::string::npos);
  }

  TEST_CASE("a group is a LaTeX fraction, non-repeating variable first") {
    const analysis a = drag();
    REQUIRE(a.groups.size() == 2);
    CHECK(latex(a.groups[0]) == "\\frac{F}{\\rho U^{2} D^{2}}");  // White, 7th ed., 5.3: drag coefficient form
    CHECK(latex(a.groups[1]) == "\\frac{\\mu}{\\rho U D}");       // the inverse of Re = rho U D / mu
    const std::string tex = latex_report(a);
    CHECK(contains(tex, "\\[ \\Pi_{1} = \\frac{F}{\\rho U^{2} D^{2}}"));
    CHECK(contains(tex, "\\[ \\Pi_{2} = \\frac{\\mu}{\\rho U D}"));
  }

  TEST_CASE("a group with only negative exponents has 1 over, one with only positive ones no fraction") {
    // the pendulum: t^2 g / L (Fox and McDonald, 8th ed., 7.2); written with L first it is L/(t^2 g)
    problem p;
    p.add("L", "m").add("t", "s").add("g", "m/s^2");
    const analysis a = analyze(p);
    REQUIRE(a.groups.size() == 1);
    CHECK(latex(a.groups[0]) == "\\frac{L}{t^{2} g}");
  }

  TEST_CASE("the text view has the matrix by variable, the rank, the groups, the exclusions and the SVD line") {
    problem p;  // the pendulum with its mass: m is in no group (Fox and McDonald, 8th ed., 7.2)
    p.add("t", "s").add("L", "m").add("m", "kg").add("g", "m/s^2");
    const std::string t = text_report(analyze(p), report_options{"Pendulum", {"period", "", "", ""}});
    CHECK(t.rfind("Pendulum\n\ndimension matrix\n", 0) == 0);
    CHECK(contains(t, "  variable  unit   L  M   T  note\n"));
    CHECK(contains(t, "  t         s      0  0   1  period\n"));
    CHECK(contains(t, "  g         m/s^2  1  0  -2\n"));
    CHECK(contains(t, "rank 3\n"));
    CHECK(contains(t, "  \u03a01 = t\u00b2\u00b7L\u207b\u00b9\u00b7g\n"));
    CHECK(contains(t, "excluded (in no group)\n  m: "));
    CHECK(contains(t, "SVD check: rank 3, agrees"));
  }

  TEST_CASE("the Markdown view is tables with escaped cells") {
    problem p;
    p.add("l_b", "mm").add("D", "mm");
    const std::string m = markdown_report(analyze(p), report_options{"A | B", {}});
    CHECK(m.rfind("## A \\| B\n", 0) == 0);
    CHECK(contains(m, "| variable | unit | L |\n| :-- | :-- | --: |\n| l\\_b | mm | 1 |\n"));
    CHECK(contains(m, "| \u03a01 | l\\_b\u00b7D\u207b\u00b9 |"));
  }

  TEST_CASE("the JSON view follows the schema of DESIGN.md") {
    const auto j = nlohmann::json::parse(json_report(drag()));
    CHECK(j.size() == 11);  // no "alternatives" unless asked for
    CHECK(j["title"] == "");
    CHECK(j["rank"] == 3);
    CHECK(j["rank_explanation"] == "");
    CHECK(j["dependent"] == "F");
    CHECK(j["basis"] == "classical");
    CHECK(j["repeating_origin"] == "chosen automatically");
    CHECK(j["isolated"] == nlohmann::json::array());
    CHECK(j["repeating"] == nlohmann::json::array({"rho", "U", "D"}));
    CHECK(j["variables"][0] ==
          nlohmann::json::parse(R"({"name": "F", "unit": "N", "dimension": {"L": 1, "M": 1, "T": -2}})"));
    CHECK(j["variables"][3]["dimension"] == nlohmann::json::parse(R"({"L": 1})"));  // only non-zero exponents
    CHECK(j["groups"][0]["exponents"] == nlohmann::json::parse(R"({"F": 1, "rho": -1, "U": -2, "D": -2})"));
    CHECK(j["groups"][0]["latex"] == "\\frac{F}{\\rho U^{2} D^{2}}");
    CHECK(j["groups"][0]["text"] == "F*rho^-1*U^-2*D^-2");
    CHECK(j["groups"][0]["matches"].is_array());
    CHECK(j["svd_check"]["rank"] == 3);
    CHECK(j["svd_check"]["agrees"] == true);
    CHECK(j["svd_check"]["singular_values"].size() == 5);  // min(7, n)
    CHECK(j["svd_check"]["max_residual"] == 0.0);
  }

  TEST_CASE("the JSON view names the configuration chosen, and has no such key without one") {
    // regime_configurations' key, as a problem file spells it (README, "Values at a design point")
    problem p;
    p.add("F", "N").add("rho", "kg/m^3").add("U", "m/s").add("D", "m").add("mu", "Pa*s");
    options o;
    o.configuration = "sphere";
    const auto j = nlohmann::json::parse(json_report(analyze(p, o)));
    CHECK(j["configuration"] == "sphere");
    CHECK_FALSE(nlohmann::json::parse(json_report(analyze(p))).contains("configuration"));
    CHECK(nlohmann::json::parse(json_scales_report(analyze(p, o)))["configuration"] == "sphere");
  }

  TEST_CASE("LaTeX and Markdown explain a rank below the count of base dimensions, as the text does") {
    // A heat exchanger's q (W), UA and C_min (W/K) and dT_max (K): L, M and T appear only as
    // L^2 M T^-3, so rank 2 of four base dimensions (Bergman et al., Fundamentals of Heat and
    // Mass Transfer, 7th ed., 11.4, from memory; W = kg m^2 s^-3, SI Brochure, table 4)
    problem p;
    p.add("q", "W").add("UA", "W/K").add("C_min", "W/K").add("dT_max", "K");
    const analysis a = analyze(p);
    REQUIRE(a.deficiency.deficient);
    const std::string tex = latex_report(a);
    // a comment line of its own, after the header: invisible in the typeset equations
    CHECK(contains(tex, "\n% rank 2 is less than the 4 base dimensions that appear (L, M, T and Theta): "));
    CHECK(contains(tex, "L, M and T appear only in the fixed combination L^2*M*T^-3\n\\[ \\Pi_{1}"));
    CHECK(contains(markdown_report(a), "\n\nrank 2 is less than the 4 base dimensions"));
    CHECK(contains(text_report(a), "  rank 2 is less than the 4 base dimensions"));
    CHECK_FALSE(contains(latex_report(drag()), "is less than"));
  }

  TEST_CASE("the JSON view gives the title, the isolated variables with reasons and the alternatives") {
    // the pendulum with its mass (Fox and McDonald, 8th ed., 7.2): m is in no group because
    // no other variable has M; the other admissible repeating set of t, L, m, g with t
    // dependent is none (L, m, g are the only three of independent dimensions)
    problem p;
    p.add("t", "s").add("L", "m").add("m", "kg").add("g", "m/s^2");
    const analysis a = analyze(p);
    report_options o;
    o.title = "Pendulum";
    o.alternatives = alternatives(p);
    const auto j = nlohmann::json::parse(json_report(a, o));
    CHECK(j["title"] == "Pendulum");
    REQUIRE(j["isolated"].size() == 1);
    CHECK(j["isolated"][0]["name"] == "m");
    CHECK(j["isolated"][0]["reason"].get<std::string>().find("base dimension M appears in no other variable") !=
          std::string::npos);
    CHECK(j["alternatives"] == nlohmann::json::array());

    // the drag on a sphere (White, 7th ed., 5.2-5.3): three other sets, first D, V, mu
    problem q;
    q.add("F", "N").add("D", "m").add("V", "m/s").add("rho", "kg/m^3").add("mu", "Pa*s");
    o.alternatives = alternatives(q);
    const auto k = nlohmann::json::parse(json_report(analyze(q), o));
    REQUIRE(k["alternatives"].size() == 3);
    CHECK(k["alternatives"][0]["repeating"] == nlohmann::json::array({"D", "V", "mu"}));
    CHECK(k["alternatives"][0]["groups"][0]["exponents"] ==
          nlohmann::json::parse(R"({"F": 1, "D": -1, "V": -1, "mu": -1})"));
    const std::string t = text_report(analyze(q), o);
    CHECK(contains(t, "  1. repeating D, V, \u03bc\n"));
    CHECK(contains(t, "in named groups: C_D = f(Re)\n"));
  }

  TEST_CASE("the relation in named groups is written only when it differs from the classical one") {
    // forced convection with k, mu, D, U repeating: the classical groups are already Nu, Re
    // and Pr (Bergman et al., Fundamentals of Heat and Mass Transfer, 7th ed., 6.5, from memory)
    problem p;
    p.add("h", "W/(m^2*K)").add("k", "W/(m*K)").add("D", "m").add("U", "m/s").add("rho", "kg/m^3");
    p.add("mu", "Pa*s").add("cp", "J/(kg*K)");
    options o;
    o.repeating = {"k", "mu", "D", "U"};
    const analysis a = analyze(p, o);
    CHECK(relation(a, text_form::ascii) == "Nu = f(Re, Pr)");
    CHECK_FALSE(contains(text_report(a), "in named groups"));
    // with the rule's D, U, rho, cp the classical groups are St, 1/Re, 1/Pe: the line is there
    CHECK(contains(text_report(analyze(p)), "in named groups: Nu = f(Re, Pr)\n"));
  }

  TEST_CASE("Markdown and LaTeX show the relation in named groups and the alternatives, as the text does") {
    // the drag on a sphere (White, 7th ed., 5.2-5.3, from memory): the classical groups are
    // C_D and 1/Re, the books write C_D = f(Re); the other sets are D, V, mu (the Stokes form
    // F/(mu V D), with rho V D/mu = Re), D, rho, mu and V, rho, mu (by hand)
    problem q;
    q.add("F", "N").add("D", "m").add("V", "m/s").add("rho", "kg/m^3").add("mu", "Pa*s");
    const analysis a = analyze(q);
    report_options o;
    o.alternatives = alternatives(q);
    const std::string md = markdown_report(a, o);
    CHECK(contains(md, "\n**In named groups:** C\\_D = f(Re)\n"));
    CHECK(contains(md,
                   "\n**Alternatives** (other admissible repeating variables, best first by the rule):\n\n"
                   "1. repeating D, V, \u03bc\n"
                   "   - \u03a01 = F\u00b7D\u207b\u00b9\u00b7V\u207b\u00b9\u00b7\u03bc\u207b\u00b9\n"
                   "   - \u03a02 = \u03c1\u00b7D\u00b7V\u00b7\u03bc\u207b\u00b9 = Re (Reynolds number)\n"
                   "2. repeating D, \u03c1, \u03bc\n"));
    CHECK(contains(md, "3. repeating V, \u03c1, \u03bc\n"));
    const std::string tex = latex_report(a, o);
    CHECK(contains(tex, "\\[ C_{\\mathrm{D}} = f(\\mathrm{Re}) \\]  % in named groups\n"));
    CHECK(contains(tex,
                   "% alternatives (other admissible repeating variables, best first by the rule)\n"
                   "% 1. repeating D, V, mu\n"
                   "\\[ \\Pi_{1} = \\frac{F}{D V \\mu}, \\quad \\Pi_{2} = \\frac{\\rho D V}{\\mu} = "
                   "\\mathrm{Re} \\]\n"));

    // none asked for: no list; none admissible: said so (the pendulum, Fox and McDonald,
    // 8th ed., 7.2: L, m, g are the only independent set)
    CHECK_FALSE(contains(markdown_report(a), "Alternatives"));
    CHECK_FALSE(contains(latex_report(a), "alternatives"));
    problem p;
    p.add("t", "s").add("L", "m").add("m", "kg").add("g", "m/s^2");
    o.alternatives = alternatives(p);
    CHECK(contains(markdown_report(analyze(p), o), "**Alternatives:** none"));
    CHECK(contains(latex_report(analyze(p), o), "% alternatives: none"));

    // a group no catalog entry names keeps the text report's neutral description: the weir's
    // P/H (White, Fluid Mechanics, ch. 10, from memory) with H and g repeating
    problem w;
    w.add("Q", "m^3/s").add("b", "m").add("H", "m").add("P", "m").add("g", "m/s^2");
    options wo;
    wo.repeating = {"H", "g"};
    CHECK(contains(markdown_report(analyze(w, wo)), "| \u03a03 | P\u00b7H\u207b\u00b9 | ratio of two lengths |\n"));
    CHECK(contains(latex_report(analyze(w, wo)), "\\[ \\Pi_{3} = \\frac{P}{H} \\]  % ratio of two lengths\n"));

    // the same relation as the groups (forced convection with k, mu, D, U repeating: Nu, Re,
    // Pr; Bergman et al., 7th ed., 6.5, from memory): no line
    problem h;
    h.add("h", "W/(m^2*K)").add("k", "W/(m*K)").add("D", "m").add("U", "m/s").add("rho", "kg/m^3");
    h.add("mu", "Pa*s").add("cp", "J/(kg*K)");
    options given;
    given.repeating = {"k", "mu", "D", "U"};
    CHECK_FALSE(contains(markdown_report(analyze(h, given)), "In named groups"));
    CHECK_FALSE(contains(latex_report(analyze(h, given)), "in named groups"));
    CHECK(contains(markdown_report(analyze(h)), "**In named groups:** Nu = f(Re, Pr)\n"));
    CHECK(contains(latex_report(analyze(h)),
                   "\\[ \\mathrm{Nu} = f(\\mathrm{Re}, \\mathrm{Pr}) \\]  % in named groups\n"));
  }

  TEST_CASE("a fractional exponent is the string p/q in JSON") {
    problem p;  // K = Y sigma sqrt(pi a) (Anderson, Fracture Mechanics, 3rd ed., 2.6): K in Pa*m^(1/2)
    p.add("sigma", "MPa").add("K", "MPa*m^(1/2)").add("a", "mm");
    const auto j = nlohmann::json::parse(json_report(analyze(p)));
    CHECK(j["variables"][1]["dimension"]["L"] == "-1/2");
    CHECK(j["groups"][0]["exponents"] == nlohmann::json::parse(R"({"sigma": 2, "K": -2, "a": 1})"));
  }

  TEST_CASE("JSON strings are escaped per RFC 8259 and invalid UTF-8 is replaced") {
    std::string out;
    detail::write_json_string(out, "a\"b\\c\n\t\x01 \xce\xbc \xff");
    CHECK(out == "\"a\\\"b\\\\c\\n\\t\\u0001 \xce\xbc \\ufffd\"");
    CHECK(nlohmann::json::parse(out) == "a\"b\\c\n\t\x01 \xce\xbc \xef\xbf\xbd");
    out.clear();
    detail::write_json_string(out, "\xed\xa0\x80");  // a UTF-16 surrogate in UTF-8 is not UTF-8 (RFC 3629)
    CHECK(out == "\"\\ufffd\\ufffd\\ufffd\"");
  }

  TEST_CASE("JSON numbers are the shortest decimal that reads back to the same double") {
    for (const double x : {0.1, 1.0 / 3.0, 6.02214076e23, 5e-324, std::numeric_limits<double>::max(), -2.5, 1e21}) {
      std::string out;
      detail::write_json_number(out, x);
      CHECK(nlohmann::json::parse(out).get<double>() == x);
    }
    std::string out;
    detail::write_json_number(out, 0.1);
    CHECK(out == "0.1");
    out.clear();
    detail::write_json_number(out, std::nan(""));  // JSON has no NaN
    CHECK(out == "null");
    out.clear();
    detail::write_json_number(out, -0.0);
    CHECK(out == "0");
  }
}
