@echo off
rem Nebulith launcher (Windows): runs nebulith.jar from the folder of this script.
rem Java: %JAVA_HOME%\bin\java.exe if set, else java on PATH. Extra JVM options: %NEBULITH_JAVA_OPTS%.
setlocal
set "NEBULITH_JAR=%~dp0nebulith.jar"
if not exist "%NEBULITH_JAR%" (
  echo nebulith: %NEBULITH_JAR% not found; the launcher must sit beside nebulith.jar 1>&2
  exit /b 1
)
set "NEBULITH_JAVA=java"
if defined JAVA_HOME if exist "%JAVA_HOME%\bin\java.exe" set "NEBULITH_JAVA=%JAVA_HOME%\bin\java.exe"
"%NEBULITH_JAVA%" %NEBULITH_JAVA_OPTS% -jar "%NEBULITH_JAR%" %*
exit /b %ERRORLEVEL%
