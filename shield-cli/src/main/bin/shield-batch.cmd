@echo off
rem shield-batch: evaluates a shield design file at frequencies (see shield-batch --help).
rem Licensed under the Apache License, Version 2.0.
rem Finds shield-all.jar in %SHIELD_JAR%, next to this script, in ..\lib, or in the repository.
setlocal
set "here=%~dp0"
if not defined SHIELD_JAR if exist "%here%shield-all.jar" set "SHIELD_JAR=%here%shield-all.jar"
if not defined SHIELD_JAR if exist "%here%..\lib\shield-all.jar" set "SHIELD_JAR=%here%..\lib\shield-all.jar"
if not defined SHIELD_JAR if exist "%here%..\..\..\..\shield-examples\target\shield-all.jar" set "SHIELD_JAR=%here%..\..\..\..\shield-examples\target\shield-all.jar"
if not defined SHIELD_JAR (
  echo shield-batch: cannot find shield-all.jar; set SHIELD_JAR or build it with mvnw package 1>&2
  exit /b 4
)
set "java=java"
if defined JAVA_HOME set "java=%JAVA_HOME%\bin\java"
"%java%" %SHIELD_JAVA_OPTS% -jar "%SHIELD_JAR%" %*
exit /b %ERRORLEVEL%
