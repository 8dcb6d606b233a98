# Generates the reference values for RReferenceCasesTest and FarTailsTest (documentation only: the Java test suite
# reads the CSV files written here and never runs R).
#
# Run from this folder:   Rscript make-reference-values.R
# Produced with: R 4.2.2 Patched (2022-11-10 r83330), package car 3.1-1 (Debian r-cran-car 3.1-1-1).
# Calls: stats::t.test (Welch: var.equal = FALSE; pooled: var.equal = TRUE; paired = TRUE) at conf.level 0.95 and 0.90;
#        stats::var.test (ratio = var(after)/var(before), two-sided, conf.level 0.95);
#        car::leveneTest(value ~ group, center = median);
#        TOST by formula from t.test's estimate, stderr and parameter (df) with pt() and qt() (alpha = 0.05, 0.10);
#        sd-growth bound sqrt(f / qf(alpha, df1, df2)) and pf(f / lambda^2, df1, df2); mean, sd, median, min, max;
#        pt, pf(lower.tail = FALSE), qnorm, qt, qf, qchisq for the distribution checks.
# Orientation (the project's): x = after, y = before, so the difference is after - before and the ratio after/before.
# Every number is printed with sprintf("%.17g").
#
# Inputs are decimal texts with a fixed number of decimals. For cases with a large common offset (1e6, 1e8) the
# project reads the full decimal text exactly (decimal residuals), while R would compute on binary64 values that
# already carry an input rounding error of up to ulp(1e8)/2 = 7.5e-9; the location and variance results are
# shift-invariant, so R is called on the exact residuals value - offset (column `residual` of r-inputs.csv) for
# t.test, var.test and the TOST formula. car::leveneTest is called on the full values as binary64, because the
# project's Brown-Forsythe also works on the binary64 values.

set.seed(20261201)
f17 <- function(x) ifelse(is.na(x), "NA", sprintf("%.17g", x))

# decimal text of an integer count of 10^-k units (exact: |u| < 2^53)
fmt_units <- function(u, k) {
  s <- ifelse(u < 0, "-", "")
  a <- sprintf("%.0f", abs(u))
  if (k == 0) return(paste0(s, a))
  a <- ifelse(nchar(a) <= k, paste0(strrep("0", pmax(0, k + 1 - nchar(a))), a), a)
  paste0(s, substr(a, 1, nchar(a) - k), ".", substr(a, nchar(a) - k + 1, nchar(a)))
}

# id, n before, n after, mean before, sd before, shift (after - before), sd after, decimals, offset, paired design
specs <- read.table(header = TRUE, stringsAsFactors = FALSE, text = "
id                 nb  na   mub    sdb    shift    sda     dec offset paired
tiny-2-2            2   2   10.0   1.0    0.3      1.5     3   0      TRUE
tiny-2-3            2   3   10.0   1.0   -0.4      0.8     3   0      FALSE
tiny-3-2            3   2   5.0    0.5    0.2      0.9     3   0      FALSE
tiny-3-3            3   3   5.0    0.5    0.1      0.4     3   0      TRUE
small-4-6           4   6   50.0   2.0    1.0      2.5     2   0      FALSE
small-5-5           5   5   20.0   1.0    0.0      1.0     3   0      TRUE
unequal-n-5-30      5   30  100.0  3.0    0.5      3.0     2   0      FALSE
unequal-n-40-7      40  7   100.0  3.0   -1.2      3.0     2   0      FALSE
unequal-n-12-25     12  25  0.0    1.0    0.2      1.0     4   0      FALSE
unequal-var-15-15   15  15  10.0   1.0    0.3      5.0     3   0      TRUE
unequal-var-8-20    8   20  10.0   4.0    0.5      0.5     3   0      FALSE
unequal-var-30-10   30  10  -3.0   0.2   -0.05     1.5     4   0      FALSE
unequal-both-6-50   6   50  2.5    0.01   0.002    0.05    5   0      FALSE
equal-20-20         20  20  7.5    0.3    0.02     0.3     3   0      TRUE
equal-50-50         50  50  12.0   0.8    0.1      0.9     3   0      TRUE
equal-200-180       200 180 30.0   1.0    0.05     1.1     3   0      FALSE
negative-10-12      10  12  -250.0 5.0    2.0      6.0     2   0      FALSE
big-shift-10-10     10  10  1.0    0.1    3.0      0.1     4   0      TRUE
near-margin-25-25   25  25  40.0   1.0    0.45     1.0     3   0      TRUE
offset-1e6-10-12    10  12  0.0    0.01   0.003    0.012   4   1e6    FALSE
offset-1e6-15-15    15  15  0.0    0.02  -0.004    0.02    4   1e6    TRUE
offset-1e6-3-3      3   3   0.0    0.01   0.002    0.01    4   1e6    TRUE
offset-1e8-8-9      8   9   0.0    0.05   0.01     0.08    3   1e8    FALSE
offset-1e8-30-30    30  30  0.0    0.05  -0.02     0.04    3   1e8    TRUE
far-tail-30-30      30  30  10.0   0.1    1.0      0.1     3   0      FALSE
flat-before-5-8     5   8   20.0   0.0    0.3      0.5     2   0      FALSE
")

inputs <- list(); tt_rows <- list(); tost_rows <- list(); var_rows <- list(); lev_rows <- list()
case_rows <- list(); sd_rows <- list(); desc_rows <- list()

for (i in seq_len(nrow(specs))) {
  s <- specs[i, ]
  k <- s$dec; sc <- 10^k
  b <- rnorm(s$nb, s$mub, s$sdb)
  a <- if (s$paired) b + s$shift + rnorm(s$na, 0, s$sda) else rnorm(s$na, s$mub + s$shift, s$sda)
  ub <- round(b * sc); ua <- round(a * sc)                 # residuals in units of 10^-k
  res_b <- fmt_units(ub, k); res_a <- fmt_units(ua, k)
  full_b <- fmt_units(s$offset * sc + ub, k); full_a <- fmt_units(s$offset * sc + ua, k)
  xb <- as.numeric(res_b); xa <- as.numeric(res_a)         # exact residuals (equal to full values when offset = 0)
  fb <- as.numeric(full_b); fa <- as.numeric(full_a)       # full values as binary64
  inputs[[i]] <- data.frame(case = s$id, group = c(rep("before", s$nb), rep("after", s$na)),
                            index = c(seq_len(s$nb), seq_len(s$na)), value = c(full_b, full_a),
                            residual = c(res_b, res_a), r_double = f17(c(fb, fa)))
  sdb <- if (sd(xb) > 0) sd(xb) else sd(xa)   # margin scale (the before sd, or the after sd when before is flat)
  # margins: symmetric, asymmetric, lower only, upper only; in the case's decimals
  m <- function(x) round(x, 4)
  margins <- list(c(-m(0.6 * sdb), m(0.6 * sdb)), c(-m(0.25 * sdb), m(1.1 * sdb)),
                  c(-m(0.4 * sdb), NA), c(NA, m(0.4 * sdb)))
  case_rows[[i]] <- data.frame(case = s$id, n_before = s$nb, n_after = s$na, decimals = k,
                               offset = sprintf("%.0f", s$offset), paired = s$paired)
  designs <- list(welch = list(var.equal = FALSE, paired = FALSE), pooled = list(var.equal = TRUE, paired = FALSE))
  if (s$paired) designs$paired <- list(var.equal = FALSE, paired = TRUE)
  for (d in names(designs)) {
    for (cl in c(0.95, 0.90)) {
      tt <- t.test(xa, xb, var.equal = designs[[d]]$var.equal, paired = designs[[d]]$paired, conf.level = cl)
      est <- if (d == "paired") unname(tt$estimate) else unname(tt$estimate[1] - tt$estimate[2])
      tt_rows[[length(tt_rows) + 1]] <- data.frame(case = s$id, method = d, conf_level = sprintf("%.2f", cl),
        t = f17(tt$statistic), df = f17(tt$parameter), p = f17(tt$p.value), estimate = f17(est),
        stderr = f17(tt$stderr), ci_lower = f17(tt$conf.int[1]), ci_upper = f17(tt$conf.int[2]))
    }
    tt <- t.test(xa, xb, var.equal = designs[[d]]$var.equal, paired = designs[[d]]$paired)
    est <- if (d == "paired") unname(tt$estimate) else unname(tt$estimate[1] - tt$estimate[2])
    se <- tt$stderr; df <- unname(tt$parameter)
    for (a_tost in c(0.05, 0.10)) for (mg in margins) {
      q <- qt(1 - a_tost, df)
      L <- mg[1]; U <- mg[2]
      tL <- if (is.na(L)) NA else (est - L) / se
      tU <- if (is.na(U)) NA else (est - U) / se
      pL <- if (is.na(L)) NA else pt(tL, df, lower.tail = FALSE)
      pU <- if (is.na(U)) NA else pt(tU, df)
      tost_rows[[length(tost_rows) + 1]] <- data.frame(case = s$id, method = d, margin_lower = f17(L),
        margin_upper = f17(U), alpha = sprintf("%.2f", a_tost), t_lower = f17(tL), t_upper = f17(tU), p_lower = f17(pL),
        p_upper = f17(pU), p = f17(max(pL, pU, na.rm = TRUE)), ci_lower = f17(est - q * se),
        ci_upper = f17(est + q * se))
    }
  }
  vt <- var.test(xa, xb)
  d1 <- unname(vt$parameter[1]); d2 <- unname(vt$parameter[2]); f <- unname(vt$statistic)
  p_acc <- min(1, 2 * min(pf(f, d1, d2), pf(f, d1, d2, lower.tail = FALSE)))
  var_rows[[i]] <- data.frame(case = s$id, ratio = f17(f), df1 = f17(d1), df2 = f17(d2), p_var_test = f17(vt$p.value),
                              p_both_tails = f17(p_acc), ci_lower = f17(vt$conf.int[1]), ci_upper = f17(vt$conf.int[2]))
  for (lambda in c(1.1, 1.5, 3)) for (a_sd in c(0.05, 0.10)) {
    sd_rows[[length(sd_rows) + 1]] <- data.frame(case = s$id, limit = sprintf("%.1f", lambda),
      alpha = sprintf("%.2f", a_sd), sd_ratio = f17(sqrt(f)), upper_bound = f17(sqrt(f / qf(a_sd, d1, d2))),
      p = f17(pf(f / lambda^2, d1, d2)))
  }
  for (grp in c("before", "after")) {
    x <- if (grp == "before") xb else xa
    off <- s$offset
    desc_rows[[length(desc_rows) + 1]] <- data.frame(case = s$id, group = grp, n = length(x),
      mean_residual = f17(mean(x)), sd = f17(sd(x)), median_residual = f17(median(x)),
      min_residual = f17(min(x)), max_residual = f17(max(x)))
  }
  g <- factor(c(rep("before", s$nb), rep("after", s$na)), levels = c("before", "after"))
  lt <- suppressWarnings(car::leveneTest(c(fb, fa), g, center = median))
  lev_rows[[i]] <- data.frame(case = s$id, f = f17(lt[1, "F value"]), df1 = f17(lt[1, "Df"]), df2 = f17(lt[2, "Df"]),
                              p = f17(lt[1, "Pr(>F)"]))
}

header <- function(file, lines) {
  con <- file(file, "w")
  writeLines(paste0("# ", c(
    "Reference values written by make-reference-values.R (in this folder); not read by R at test time.",
    paste0(R.version.string, "; car ", as.character(packageVersion("car")), "; set.seed(20261201)"),
    lines)), con)
  close(con)
}
wcsv <- function(df, file, lines) {
  header(file, lines)
  suppressWarnings(write.table(df, file, sep = ",", quote = FALSE, row.names = FALSE, append = TRUE))
}
bind <- function(l) do.call(rbind, l)

wcsv(bind(case_rows), "r-cases.csv", c("One row per case. offset: common offset added to every value (0 = none).",
  "paired: the case also has a paired design (equal n, after_i = before_i + shift + noise)."))
wcsv(bind(inputs), "r-inputs.csv", c("value: the decimal text the project reads; residual: value - offset, what R",
  "computed t.test/var.test on; r_double: as.numeric(value) in R, %.17g (what car::leveneTest saw)."))
wcsv(bind(tt_rows), "r-ttest.csv", c("t.test(x = after, y = before, var.equal = (method == 'pooled'),",
  "paired = (method == 'paired'), conf.level) on the residuals; estimate = mean(x) - mean(y) as t.test forms it",
  "(the mean difference when paired); stderr = t.test()$stderr."))
wcsv(bind(tost_rows), "r-tost.csv", c("TOST by formula on t.test(after, before, ...) at alpha each side:",
  "t_lower = (est - L)/se, p_lower = pt(t_lower, df, lower.tail = FALSE); t_upper = (est - U)/se,",
  "p_upper = pt(t_upper, df); p = max of those present; ci = est -/+ qt(1 - alpha, df) * se (the 1 - 2 alpha",
  "interval; alpha = 0.05 and 0.10).",
  "NA = margin side absent (one-sided margin)."))
wcsv(bind(var_rows), "r-var-test.csv", c("var.test(x = after, y = before) on the residuals, conf.level 0.95.",
  "p_var_test = var.test()$p.value, which R forms as 2*min(p, 1 - p); p_both_tails = min(1, 2*min(pf(f, d1, d2),",
  "pf(f, d1, d2, lower.tail = FALSE))), each tail from its own side."))
wcsv(bind(sd_rows), "r-sd-growth.csv", c("sd-growth limit lambda on the var.test ratio f = var(after)/var(before) of the",
  "residuals: upper_bound = sqrt(f / qf(alpha, df1, df2)) (the one-sided 1 - alpha bound on sd_a/sd_b),",
  "p = pf(f / lambda^2, df1, df2) (H0: sd_a/sd_b >= lambda; limit met iff p < alpha)."))
wcsv(bind(desc_rows), "r-descriptives.csv", c("mean(), sd(), median(), min(), max() of each group's residuals",
  "(value - offset; add the offset back for the value itself)."))
wcsv(bind(lev_rows), "r-levene.csv", c("car::leveneTest(c(before, after), factor(group), center = median) on the full",
  "values as binary64 (r_double in r-inputs.csv): F value, Df, residual Df, Pr(>F). NA/Inf: F undefined."))

# ---- distribution values for FarTailsTest ----
dist <- list()
add <- function(fn, x, a, b, v) dist[[length(dist) + 1]] <<- data.frame(fn = fn, x = f17(x), df1 = f17(a), df2 = f17(b), value = f17(v))
for (a in list(c(-40, 10), c(-40, 10.5), c(-12, 3), c(-100, 50), c(-8.5, 136.874977), c(-5, 1), c(-3, 2.5),
               c(-2, 1000), c(-1e3, 4), c(-20, 326))) add("pt", a[1], a[2], NA, pt(a[1], a[2]))
for (a in list(c(50, 3, 20), c(200, 10, 10), c(1000, 1, 5), c(30, 239, 239), c(1.123037, 239, 239), c(3.738245, 10, 8),
               c(12, 1, 90), c(1.70591, 9, 90), c(1e4, 2, 2), c(4, 2.5, 7.5)))
  add("pf_upper", a[1], a[2], a[3], pf(a[1], a[2], a[3], lower.tail = FALSE))
for (a in list(c(0.01, 10, 12), c(1e-4, 3, 30), c(0.5, 239, 239)))
  add("pf_lower", a[1], a[2], a[3], pf(a[1], a[2], a[3]))
for (p in c(1e-300, 1e-12, 0.025, 0.5, 0.975)) add("qnorm", p, NA, NA, qnorm(p))
# far lower tails of the quantiles (q = 1e-300 only where t^2 stays finite, i.e. df >= 2)
for (df in c(1, 2, 2.5, 3, 5, 30, 1000))
  for (p in c(1e-12, 1e-15, 1e-20, 1e-50, 1e-100, if (df >= 2) 1e-300)) add("qt", p, df, NA, qt(p, df))
for (dd in list(c(1, 5), c(4, 2), c(2, 1), c(10, 8), c(239, 239)))
  for (p in c(1e-12, 1e-20, 1e-50)) add("qf", p, dd[1], dd[2], qf(p, dd[1], dd[2]))
for (df in c(1, 4, 30, 1000)) for (p in c(1e-20, 1e-50, 1e-100)) add("qchisq", p, df, NA, qchisq(p, df))
for (df in c(1, 2, 3, 4.5, 10, 15.532514, 30, 136.874977, 326, 1e4))
  for (p in c(0.975, 0.95, 0.025, 1e-10)) add("qt", p, df, NA, qt(p, df))
for (dd in list(c(239, 239), c(10, 8), c(1, 90), c(9, 90), c(3, 2.5), c(24, 11), c(100, 3)))
  for (p in c(0.025, 0.975, 0.05, 0.95, 1e-6)) add("qf", p, dd[1], dd[2], qf(p, dd[1], dd[2]))
for (df in c(1, 2, 9, 50, 1000, 3.5))
  for (p in c(0.025, 0.975, 0.05, 0.95, 1e-10)) add("qchisq", p, df, NA, qchisq(p, df))
wcsv(bind(dist), "r-distributions.csv", c("fn: pt = pt(x, df1); pf_upper = pf(x, df1, df2, lower.tail = FALSE);",
  "pf_lower = pf(x, df1, df2); qnorm = qnorm(x); qt = qt(x, df1); qf = qf(x, df1, df2); qchisq = qchisq(x, df1)."))
cat("written\n")
